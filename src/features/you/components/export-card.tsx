import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { saveFile } from '@/lib/files';
import { space } from '@/theme/tokens';
import { downloadExport, type ExportFile } from '../api';

const FILES: { file: ExportFile; label: string }[] = [
  { file: 'hunts.csv', label: 'Hunts (CSV)' },
  { file: 'scans.csv', label: 'Notes (CSV)' },
  { file: 'keepers.csv', label: 'Keepers (CSV)' },
  { file: 'json', label: 'Everything (JSON)' },
];

/** Everything the user owns, as CSV files a spreadsheet opens and one JSON file with it all. */
export function ExportCard() {
  const [saved, setSaved] = useState<string | null>(null);
  const exporting = useSubmit(async (file: ExportFile) => {
    setSaved(null);
    const { name, blob } = await downloadExport(file);
    await saveFile(name, blob);
    setSaved(name);
  });
  return (
    <Card testID="export-card">
      <Text variant="label" tone="muted">
        EXPORT
      </Text>
      <Text tone="muted">Your hunts, every note you logged and your keepers as spreadsheet files, to read elsewhere. These files leave photos out; the full archive above carries everything, photos included.</Text>
      {exporting.message ? <Notice tone="error">{exporting.message}</Notice> : null}
      {saved ? <Notice tone="ok">{`Saved ${saved}.`}</Notice> : null}
      <View style={styles.buttons}>
        {FILES.map(({ file, label }) => (
          <Button key={file} compact kind="secondary" label={label} busy={exporting.busy} onPress={() => void exporting.submit(file)} testID={`export-${file}`} />
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
