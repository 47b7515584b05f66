import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ArchiveImportResult, ArchiveKindCounts } from '@shared/contracts/archive';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { canPickFiles, pickBinaryFile } from '@/lib/files';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { useSession } from '@/lib/session/session-provider';
import { afterRestore, previewArchive, restoreArchive, type RestoreProgress } from '../archive-api';

const count = (n: number) => n.toLocaleString('en-US');

const KINDS: Array<{ key: keyof ArchiveImportResult['counts']; label: string }> = [
  { key: 'hunts', label: 'Hunts' },
  { key: 'notes', label: 'Notes' },
  { key: 'keepers', label: 'Keepers' },
  { key: 'photos', label: 'Photos' },
  { key: 'weightTables', label: 'Weight tables' },
  { key: 'watchPatterns', label: 'Watch patterns' },
];

const PHASES: Record<RestoreProgress['phase'], string> = {
  checking: 'Checking the archive',
  settings: 'Weights and watch patterns',
  hunts: 'Hunts and straps',
  notes: 'Notes',
  keepers: 'Keepers',
  photos: 'Photos',
};

function CountsTable({ counts }: { counts: ArchiveImportResult['counts'] }) {
  const theme = useTheme();
  const cell = (kind: ArchiveKindCounts, field: keyof ArchiveKindCounts) => (
    <Text style={[styles.number, styles.mono]}>{count(kind[field])}</Text>
  );
  return (
    <View style={[styles.table, { borderColor: theme.line }]} testID="archive-counts">
      <View style={styles.tableRow}>
        <Text variant="caption" tone="muted" style={styles.name}>
          In the archive
        </Text>
        <Text variant="caption" tone="muted" style={styles.number}>
          To add
        </Text>
        <Text variant="caption" tone="muted" style={styles.number}>
          Already here
        </Text>
      </View>
      {KINDS.map(({ key, label }) => (
        <View key={key} style={styles.tableRow}>
          <Text style={styles.name}>{`${label} · ${count(counts[key].inArchive)}`}</Text>
          {cell(counts[key], 'add')}
          {cell(counts[key], 'present')}
        </View>
      ))}
    </View>
  );
}

/** Hunts that come back as the importer's own, grouped by why, in words for the notice. */
const adoptedLine = (hunts: ArchiveImportResult['adoptedHunts']) => {
  const titles = (reason: 'crew' | 'owned-here') => hunts.filter((hunt) => hunt.reason === reason).map((hunt) => hunt.title);
  const crew = titles('crew');
  const copies = titles('owned-here');
  return [
    crew.length ? `You were crew in ${crew.join('; ')}: ${crew.length === 1 ? 'it becomes' : 'they become'} yours.` : null,
    copies.length ? `Someone else on this server owns ${copies.join('; ')}, so you get your own ${copies.length === 1 ? 'copy' : 'copies'}.` : null,
  ]
    .filter(Boolean)
    .join(' ');
};

/**
 * Choose an archive, see what it would add (a dry run on the server), confirm, and watch each part go in.
 * Restoring the same archive twice adds nothing, so a restore cut short is finished by running it again.
 */
export function ArchiveRestoreCard() {
  const { updateUser } = useSession();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<ArchiveImportResult | null>(null);
  const [progress, setProgress] = useState<RestoreProgress | null>(null);
  const [outcome, setOutcome] = useState<ArchiveImportResult | null>(null);

  const choose = useSubmit(async () => {
    const picked = await pickBinaryFile('.zip,application/zip');
    if (!picked) return;
    setFile(picked);
    setPreview(null);
    setOutcome(null);
    setPreview(await previewArchive(picked));
  });
  const restore = useSubmit(async () => {
    if (!file) return;
    setProgress({ phase: 'checking', done: 0, total: 1 });
    try {
      setOutcome(await restoreArchive(file, setProgress));
      setPreview(null);
      setFile(null);
      const me = await afterRestore();
      updateUser({ id: me.id, email: me.email, displayName: me.displayName, role: me.role });
    } finally {
      setProgress(null);
    }
  });
  const adding = preview ? Object.values(preview.counts).reduce((sum, kind) => sum + kind.add, 0) : 0;

  return (
    <Card testID="archive-restore-card">
      <Text variant="label" tone="muted">
        RESTORE FROM AN ARCHIVE
      </Text>
      <Text tone="muted">
        Bring back a Strapsift archive (.zip) into this account. Nothing is changed until you confirm, and anything already here is left as it is.
      </Text>
      {choose.message ? <Notice tone="error">{choose.message}</Notice> : null}
      {choose.fields.archive && !choose.message?.includes(choose.fields.archive) ? <Notice tone="error">{choose.fields.archive}</Notice> : null}
      <View style={styles.row}>
        <Button
          kind="secondary"
          label={file ? 'Choose another archive' : 'Choose an archive'}
          busy={choose.busy}
          disabled={!canPickFiles || restore.busy}
          onPress={() => void choose.submit()}
          testID="archive-choose"
        />
        {file ? (
          <Text variant="caption" tone="muted" style={styles.mono}>
            {file.name}
          </Text>
        ) : null}
      </View>
      {choose.busy ? <Text tone="muted">Reading and checking the archive…</Text> : null}
      {preview ? (
        <>
          <Text tone="muted">{`Made ${preview.exportedAt.slice(0, 10)} for ${preview.exportedBy}.`}</Text>
          <CountsTable counts={preview.counts} />
          {preview.adoptedHunts.length ? (
            <Notice tone="info" title="These hunts come back as your own">
              {adoptedLine(preview.adoptedHunts)}
            </Notice>
          ) : null}
          {preview.profile.changes ? <Notice tone="info">{`Your display name becomes “${preview.profile.displayName}”, as in the archive.`}</Notice> : null}
          {preview.problems.length ? (
            <Notice tone="error" title="This archive cannot be restored">
              {preview.problems
                .slice(0, 8)
                .map((problem) => `${problem.where}: ${problem.message}`)
                .join('\n')}
            </Notice>
          ) : null}
          {restore.message ? <Notice tone="error">{restore.message}</Notice> : null}
          {progress ? (
            <ProgressBar
              done={progress.done}
              total={progress.total}
              label={`${PHASES[progress.phase]}: ${count(progress.done)} of ${count(progress.total)}`}
              testID="archive-restore-progress"
            />
          ) : null}
          <Button
            label={adding ? 'Restore this archive' : 'Nothing new to restore'}
            busy={restore.busy}
            disabled={adding === 0 || preview.problems.length > 0}
            onPress={() => void restore.submit()}
            testID="archive-restore"
          />
        </>
      ) : null}
      {outcome ? (
        <Notice tone="ok" title="Restored">
          {KINDS.map(({ key, label }) => `${label.toLowerCase()}: ${count(outcome.counts[key].add)} added`).join(' · ') +
            (outcome.adoptedHunts.length ? `. ${adoptedLine(outcome.adoptedHunts)}` : '.')}
        </Notice>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, alignItems: 'center', flexWrap: 'wrap' },
  mono: { fontFamily: fonts.mono },
  table: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm, gap: space.xs },
  tableRow: { flexDirection: 'row', gap: space.sm, alignItems: 'center' },
  name: { flex: 2 },
  number: { flex: 1, textAlign: 'right' },
});
