import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { DENOMINATIONS, type ImportRow } from '@shared/contracts';
import { checkLog, guessMapping, readLogCsv, type ColumnMapping, type LogFile } from '@shared/transfer/import-log';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { canPickFiles, pickTextFile } from '@/lib/files';
import { formatCount } from '@/lib/format';
import { space } from '@/theme/tokens';
import { useHunts } from '../../hunts/api';
import { runImport, type ImportOutcome, type ImportTarget } from '../api';
import { ImportColumns } from './import-columns';
import { ImportPreview } from './import-preview';
import { ImportProgress } from './import-progress';

interface Loaded {
  name: string;
  log: LogFile;
}

/**
 * Brings an old log in: pick a CSV, say which column is which, see every row's verdict (each bad row
 * says why), choose the hunt, then import in parts of 500 rows with progress. Importing the same file
 * again adds nothing: the server derives each note's id from the note itself.
 */
export function ImportCard() {
  const [loaded, setLoaded] = useState<Loaded | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const [target, setTarget] = useState<string>('new');
  const [title, setTitle] = useState('');
  const [denomination, setDenomination] = useState<number>(1);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [outcome, setOutcome] = useState<ImportOutcome | null>(null);
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
    const into: ImportTarget = target === 'new' ? { newHunt: { title, denomination } } : { huntId: target };
    setOutcome(await runImport(rows, into, (done, total) => setProgress({ done, total })));
  });

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
            {loaded.name} · {formatCount(loaded.log.rows.length)} rows
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
          <ImportColumns headers={loaded.log.headers} mapping={mapping} onChange={setMapping} editing={editingColumns} onEditing={setEditingColumns} />
          <ImportPreview good={good} bad={bad} />
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
          <ImportProgress progress={progress} outcome={outcome} />
          <View style={styles.row}>
            <Button
              label={good.length ? `Import ${formatCount(good.length)} ${good.length === 1 ? 'row' : 'rows'}` : 'Nothing to import'}
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
});
