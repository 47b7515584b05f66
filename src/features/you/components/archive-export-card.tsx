import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { saveFile } from '@/lib/files';
import { downloadArchive, useArchiveSummary } from '../archive-api';

const count = (n: number) => n.toLocaleString('en-US');
const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(bytes < 10 * 1024 * 1024 ? 1 : 0)} MB`;

/** Everything in one zip that Strapsift can read back: the way to take a log elsewhere, or to keep it safe. */
export function ArchiveExportCard() {
  const summary = useArchiveSummary();
  const [received, setReceived] = useState<number | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const download = useSubmit(async () => {
    setSaved(null);
    setReceived(0);
    try {
      const { name, blob } = await downloadArchive(setReceived);
      await saveFile(name, blob);
      setSaved(`Saved ${name} (${megabytes(blob.size)}).`);
    } finally {
      setReceived(null);
    }
  });
  const totals = summary.data;
  // The zip's size is only known at the end; the estimate keeps the bar honest until the last bytes.
  const expected = Math.max(totals?.estimatedBytes ?? 1, received ?? 0);
  return (
    <Card testID="archive-export-card">
      <Text variant="label" tone="muted">
        FULL ARCHIVE
      </Text>
      <Text tone="muted">
        {totals
          ? `All of it in one zip: ${count(totals.hunts)} hunts, ${count(totals.notes)} notes, ${count(totals.keepers)} keepers and ${count(totals.photos)} photos, with your weights, watch patterns and profile. Restore it here or on another Strapsift server.`
          : 'All of it in one zip, photos included, that you can restore here or on another Strapsift server.'}
      </Text>
      {download.message ? <Notice tone="error">{download.message}</Notice> : null}
      {saved ? <Notice tone="ok">{saved}</Notice> : null}
      {received !== null ? (
        <ProgressBar done={received} total={expected} label={`${megabytes(received)} of about ${megabytes(expected)} downloaded`} testID="archive-export-progress" />
      ) : null}
      <Button
        label="Download archive (.zip)"
        busy={download.busy}
        onPress={() => void download.submit()}
        testID="archive-export"
      />
    </Card>
  );
}
