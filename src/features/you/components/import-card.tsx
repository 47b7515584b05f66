import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { mutate } from 'swr';
import { DENOMINATIONS, IMPORT_CHUNK_ROWS, IMPORT_FIELDS, type ImportField, type ImportRow, type ImportRowsResponse } from '@shared/contracts';
import { checkLog, guessMapping, readLogCsv, type CheckedRow, type ColumnMapping, type LogFile } from '@shared/transfer/import-log';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { DataTable } from '@/components/ui/data-table';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { canPickFiles, pickTextFile } from '@/lib/files';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { fonts, radius, space } from '@/theme/tokens';
import { createHunt, deleteHunt, revalidateHunts, useHunts } from '../../hunts/api';
import { importRows } from '../api';

const FIELD_LABEL: Record<ImportField, string> = {
  serial: 'Serial (required)',
  date: 'Date',
  strap: 'Strap',
  series: 'Series',
  district: 'District',
  star: 'Star',
  pulled: 'Pulled',
  note: 'Note',
  entryMethod: 'Entered by (keypad or camera)',
  cameraConfidence: 'Camera confidence',
};
const count = (n: number) => n.toLocaleString('en-US');
const flags = (row: CheckedRow) => [row.row?.star ? '★ star' : null, row.row?.pulled ? 'pulled' : null].filter(Boolean).join(' · ');

interface Loaded {
  name: string;
  log: LogFile;
}

interface Outcome extends ImportRowsResponse {
  huntId: string | null;
  removedEmptyHunt: boolean;
}

/**
 * Brings an old log in: pick a CSV, say which column is which, see every row's verdict (each bad row
 * says why), choose the hunt, then import in parts of 500 rows with progress. Importing the same file
 * again adds nothing: the server derives each note's id from the note itself.
 */
export function ImportCard() {
  const theme = useTheme();
  const { isWide } = useLayout();
  const [loaded, setLoaded] = useState<Loaded | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const [target, setTarget] = useState<string>('new');
  const [title, setTitle] = useState('');
  const [denomination, setDenomination] = useState<number>(1);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [editingColumns, setEditingColumns] = useState(false);
  const hunts = useHunts();

  const checked = useMemo(() => (loaded && mapping ? checkLog(loaded.log.rows, mapping) : []), [loaded, mapping]);
  const good = useMemo(() => checked.filter((row) => row.ok), [checked]);
  const bad = useMemo(() => checked.filter((row) => !row.ok), [checked]);

  const choose = useSubmit(async () => {
    const file = await pickTextFile('.csv,text/csv,text/plain');
    if (!file) return;
    const log = readLogCsv(file.text);
    setLoaded({ name: file.name, log });
    setMapping(guessMapping(log.headers));
    setTitle(`Imported: ${file.name.replace(/\.[^.]+$/, '')}`.slice(0, 120));
    setOutcome(null);
    setProgress(null);
    setEditingColumns(false);
  });

  const run = useSubmit(async () => {
    if (!loaded || good.length === 0) return;
    const rows = good.map((row) => row.row as ImportRow);
    let huntId = target;
    let created = false;
    if (target === 'new') {
      const dates = rows.map((row) => row.date).filter((date): date is string => !!date).sort();
      const hunt = await createHunt({
        title: title.trim() || 'Imported log',
        source: 'Imported from an old log',
        denomination,
        plannedStraps: Math.min(400, Math.max(1, Math.ceil(rows.length / 100))),
        ...(dates[0] ? { startedAt: dates[0] } : {}),
      });
      huntId = hunt.id;
      created = true;
    }
    const total: Outcome = { stored: 0, duplicates: 0, keepers: 0, rejected: [], huntId, removedEmptyHunt: false };
    setProgress({ done: 0, total: rows.length });
    for (let i = 0; i < rows.length; i += IMPORT_CHUNK_ROWS) {
      const part = await importRows({ huntId, rows: rows.slice(i, i + IMPORT_CHUNK_ROWS) });
      total.stored += part.stored;
      total.duplicates += part.duplicates;
      total.keepers += part.keepers;
      total.rejected.push(...part.rejected);
      setProgress({ done: Math.min(rows.length, i + IMPORT_CHUNK_ROWS), total: rows.length });
    }
    // A second import of the same file into a new hunt would leave it empty: it goes again.
    if (created && total.stored === 0) {
      await deleteHunt(huntId);
      total.huntId = null;
      total.removedEmptyHunt = true;
    }
    await Promise.all([revalidateHunts(), mutate((key) => typeof key === 'string' && key.startsWith('/keepers'))]);
    setOutcome(total);
  });

  const fieldOptions = (loaded?.log.headers ?? []).map((header, index) => ({ value: index, label: header || `column ${index + 1}` }));
  const huntOptions = [
    { value: 'new', label: 'A new hunt' },
    ...(hunts.data?.items ?? [])
      .filter((hunt) => hunt.status === 'open')
      .slice(0, 5)
      .map((hunt) => ({ value: hunt.id, label: hunt.title })),
  ];

  return (
    <Card testID="import-card">
      <Text variant="label" tone="muted">
        IMPORT AN OLD LOG
      </Text>
      <Text tone="muted">
        A CSV file with a serial in each row, and if you have them a date, strap, series, district, star, pulled and note. Pulled notes become keepers.
      </Text>
      {!canPickFiles ? <Notice tone="info">Importing a file works in the web app.</Notice> : null}
      {choose.message ? <Notice tone="error">{choose.message}</Notice> : null}
      <View style={styles.row}>
        <Button
          compact
          kind={loaded ? 'secondary' : 'primary'}
          label={loaded ? 'Choose another file' : 'Choose a CSV file'}
          busy={choose.busy}
          disabled={!canPickFiles || run.busy}
          onPress={() => void choose.submit()}
          testID="import-choose"
        />
        {loaded ? (
          <Text variant="caption" tone="muted" testID="import-file">
            {loaded.name} · {count(loaded.log.rows.length)} rows
          </Text>
        ) : null}
      </View>

      {loaded && mapping ? (
        <>
          {loaded.log.problems.map((problem) => (
            <Notice key={problem} tone="caution">
              {problem}
            </Notice>
          ))}
          <Text variant="label" tone="muted">
            WHICH COLUMN IS WHICH
          </Text>
          <View style={styles.row}>
            <Text style={styles.grow} testID="import-columns">
              {IMPORT_FIELDS.filter((field) => mapping[field] !== null)
                .map((field) => `${FIELD_LABEL[field].replace(' (required)', '')} ← “${loaded.log.headers[mapping[field]!] || `column ${mapping[field]! + 1}`}”`)
                .join(' · ') || 'No column is matched yet.'}
            </Text>
            <Button
              compact
              kind="quiet"
              label={editingColumns || mapping.serial === null ? 'Done' : 'Change columns'}
              onPress={() => setEditingColumns(!editingColumns)}
              testID="import-edit-columns"
            />
          </View>
          {(editingColumns || mapping.serial === null ? IMPORT_FIELDS : []).map((field) => (
            <ChoiceRow
              key={field}
              label={FIELD_LABEL[field]}
              options={[{ value: -1, label: '—' }, ...fieldOptions]}
              value={mapping[field] ?? -1}
              onChange={(value) => setMapping({ ...mapping, [field]: value === -1 ? null : value })}
              testID={`import-map-${field}`}
            />
          ))}

          <Text variant="label" tone="muted">
            PREVIEW
          </Text>
          <Text testID="import-verdict">
            {count(good.length)} {good.length === 1 ? 'row is' : 'rows are'} ready
            {bad.length ? `, ${count(bad.length)} ${bad.length === 1 ? 'has a problem and is' : 'have problems and are'} left out` : ''}.
          </Text>
          {bad.length ? (
            <View style={[styles.problems, { borderColor: theme.line }]} testID="import-problems">
              {bad.slice(0, 50).map((row) => (
                <Text key={row.line} variant="caption">
                  <Text variant="caption" style={styles.mono}>
                    line {row.line}
                    {row.serial ? ` · ${row.serial}` : ''}
                  </Text>
                  {' — '}
                  <Text variant="caption" tone="danger">
                    {row.problems.join('; ')}
                  </Text>
                </Text>
              ))}
              {bad.length > 50 ? (
                <Text variant="caption" tone="muted">
                  …and {count(bad.length - 50)} more.
                </Text>
              ) : null}
            </View>
          ) : null}
          {good.length ? (
            <DataTable
              label="First rows to import"
              rowKey={(row) => String(row.line)}
              rows={good.slice(0, 6)}
              columns={[
                ...(isWide ? [{ key: 'line', header: 'Line', width: 52, cell: (row: CheckedRow) => <Text style={styles.mono}>{row.line}</Text> }] : []),
                {
                  key: 'serial',
                  header: 'Serial',
                  flex: 2,
                  cell: (row: CheckedRow) => (
                    <View>
                      <Text style={[styles.mono, styles.small]}>{row.serial}</Text>
                      {!isWide && (row.row?.star || row.row?.pulled) ? (
                        <Text variant="caption" tone="muted">
                          {flags(row)}
                        </Text>
                      ) : null}
                    </View>
                  ),
                },
                { key: 'date', header: 'Date', width: 108, cell: (row: CheckedRow) => <Text style={[styles.mono, styles.small]}>{row.row?.date?.slice(0, 10) ?? '—'}</Text> },
                ...(isWide ? [{ key: 'flags', header: 'Star · pulled', flex: 1.2, cell: (row: CheckedRow) => <Text>{flags(row) || '—'}</Text> }] : []),
              ]}
              testID="import-preview"
            />
          ) : null}

          <ChoiceRow label="Into" options={huntOptions} value={target} onChange={(value) => setTarget(String(value))} testID="import-target" />
          {target === 'new' ? (
            <>
              <Field label="New hunt's title" value={title} onChangeText={setTitle} maxLength={120} testID="import-title" />
              <ChoiceRow
                label="Denomination"
                options={DENOMINATIONS.map((value) => ({ value, label: `$${value}` }))}
                value={denomination}
                onChange={(value) => setDenomination(Number(value))}
              />
            </>
          ) : null}
          {run.message ? <Notice tone="error">{run.message}</Notice> : null}
          {progress ? (
            <View style={styles.progress} accessibilityRole="progressbar" aria-valuenow={progress.done} aria-valuemax={progress.total} testID="import-progress">
              <View style={[styles.track, { backgroundColor: theme.surfaceSunken, borderColor: theme.line }]}>
                <View style={[styles.fill, { backgroundColor: theme.brand, width: `${(100 * progress.done) / Math.max(1, progress.total)}%` }]} />
              </View>
              <Text variant="caption" tone="muted">
                {count(progress.done)} of {count(progress.total)} rows sent
              </Text>
            </View>
          ) : null}
          {outcome ? (
            <Notice tone={outcome.stored ? 'ok' : 'info'} title="Imported">
              {[
                `${count(outcome.stored)} new ${outcome.stored === 1 ? 'note' : 'notes'}`,
                outcome.duplicates ? `${count(outcome.duplicates)} already in Strapsift` : null,
                outcome.keepers ? `${count(outcome.keepers)} new ${outcome.keepers === 1 ? 'keeper' : 'keepers'}` : null,
                outcome.rejected.length ? `${count(outcome.rejected.length)} refused (${outcome.rejected.slice(0, 3).map((r) => `line ${r.line}: ${r.reason}`).join('; ')})` : null,
              ]
                .filter(Boolean)
                .join(' · ') + (outcome.removedEmptyHunt ? '. Nothing was new, so no hunt was made.' : '.')}
            </Notice>
          ) : null}
          <View style={styles.row}>
            <Button
              label={good.length ? `Import ${count(good.length)} ${good.length === 1 ? 'row' : 'rows'}` : 'Nothing to import'}
              busy={run.busy}
              disabled={good.length === 0}
              onPress={() => void run.submit()}
              testID="import-run"
            />
          </View>
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, alignItems: 'center', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 200 },
  mono: { fontFamily: fonts.mono },
  small: { fontSize: 14 },
  problems: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm, gap: space.xs, maxHeight: 260, overflow: 'scroll' },
  progress: { gap: space.xs },
  track: { height: 10, borderRadius: radius.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%' },
});
