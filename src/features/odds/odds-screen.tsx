import { useCallback, useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { DEFAULT_WEIGHTS, SCORE_EXPLANATION, type WeightTable } from '@shared/engine';
import type { WeightTableView } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { activateWeightTable, createWeightTable, replaceWeightTable, useWatchForReading, useWatchPatterns, useWeightTables } from './api';
import { RarityTable } from './components/rarity-table';
import { ScorePreview } from './components/score-preview';
import { WatchList } from './components/watch-list';
import { WeightEditor } from './components/weight-editor';
import { draftToTable, tableToDraft, type WeightDraft } from './weight-draft';

// Circulating notes stop at their run end (TRADE.md; run sizes are common practice among hunters).
const DOMAINS = [
  { value: 99_999_999, label: 'Every serial' },
  { value: 96_000_000, label: '$1–$20 notes (to 96,000,000)' },
  { value: 99_200_000, label: '$50, $100 (to 99,200,000)' },
] as const;

export function OddsScreen() {
  const { isWide } = useLayout();
  const tables = useWeightTables();
  const watchPatterns = useWatchPatterns();
  const watch = useWatchForReading();
  const items = tables.data?.items ?? [];
  const active = items.find((table) => table.active) ?? null;
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const selected: WeightTableView | null = items.find((table) => table.id === selectedId) ?? active;
  const [name, setName] = useState('');
  const [draft, setDraft] = useState<WeightDraft>(tableToDraft(DEFAULT_WEIGHTS));
  const [newName, setNewName] = useState('');
  const [domainLast, setDomainLast] = useState<number>(99_999_999);
  const [saved, setSaved] = useState<string | null>(null);

  useEffect(() => {
    if (selected) {
      setDraft(tableToDraft(selected.weights));
      setName(selected.name);
    }
  }, [selected?.id, selected?.updatedAt]); // eslint-disable-line react-hooks/exhaustive-deps

  const checked = useMemo(() => draftToTable(draft), [draft]);
  const previewWeights: WeightTable | null = checked.ok ? (checked.table as WeightTable) : null;
  const weightOf = useCallback(
    (key: string) => {
      const table = previewWeights ?? DEFAULT_WEIGHTS;
      const [group, sub] = key.split('.');
      if (group === 'runs') return table.runs[Number(sub) as 4];
      if (group === 'counts') return table.counts[Number(sub) as 5];
      return table.patterns[key as keyof WeightTable['patterns']];
    },
    [previewWeights],
  );

  const save = useSubmit(async () => {
    if (!selected || !checked.ok) return;
    await replaceWeightTable(selected.id, { name: name.trim() || selected.name, weights: checked.table });
    setSaved(`Saved “${name.trim() || selected.name}”.`);
  });
  const create = useSubmit(async () => {
    const table = await createWeightTable({ name: newName.trim(), weights: checked.ok ? checked.table : undefined });
    setNewName('');
    setSelectedId(table.id);
    setSaved(`Created “${table.name}” from the weights on screen.`);
  });
  const activate = useSubmit(async (id: string) => {
    await activateWeightTable(id);
    setSaved('Sift now scores with this table.');
  });

  const tablePicker = (
    <Card>
      <Text variant="label" tone="muted">
        WEIGHT TABLES
      </Text>
      {tables.error && !tables.data ? <Notice tone="caution">Your tables could not be loaded; showing the defaults.</Notice> : null}
      <View style={styles.pills}>
        {items.map((table) => (
          <Button
            key={table.id}
            compact
            kind={table.id === selected?.id ? 'primary' : 'secondary'}
            label={`${table.name}${table.active ? ' · active' : ''}`}
            accessibilityState={{ selected: table.id === selected?.id }}
            onPress={() => setSelectedId(table.id)}
          />
        ))}
      </View>
      {selected && !selected.active ? (
        <Button kind="secondary" label={`Make “${selected.name}” active`} busy={activate.busy} onPress={() => void activate.submit(selected.id)} testID="activate-table" />
      ) : null}
      <View style={styles.newRow}>
        <View style={styles.grow}>
          <Field label="New table from these weights" value={newName} onChangeText={setNewName} placeholder="e.g. Bundle nights" error={create.fields.name} />
        </View>
        <Button label="Create" kind="secondary" busy={create.busy} disabled={!newName.trim()} onPress={() => void create.submit()} />
      </View>
    </Card>
  );

  const editor = (
    <Card>
      <View style={styles.editorHead}>
        <View style={styles.grow}>
          <Field label="Table name" value={name} onChangeText={setName} error={save.fields.name} testID="table-name" />
        </View>
      </View>
      <WeightEditor draft={draft} onChange={setDraft} errors={checked.ok ? save.fields : { ...save.fields, ...checked.fields }} />
      {save.message ? <Notice tone="error">{save.message}</Notice> : null}
      {saved ? <Notice tone="ok">{saved}</Notice> : null}
      <View style={styles.pills}>
        <Button label="Save weights" busy={save.busy} disabled={!selected || !checked.ok} onPress={() => void save.submit()} testID="save-weights" />
        <Button kind="secondary" label="Back to saved" onPress={() => selected && setDraft(tableToDraft(selected.weights))} />
        <Button kind="quiet" label="Start from defaults" onPress={() => setDraft(tableToDraft(tables.data?.defaults ?? DEFAULT_WEIGHTS))} />
      </View>
    </Card>
  );

  const preview = (
    <Card>
      <Text variant="label" tone="muted">
        LIVE PREVIEW
      </Text>
      <ScorePreview weights={previewWeights} watch={watch} />
    </Card>
  );

  const watchCard = (
    <Card>
      <Text variant="label" tone="muted">
        WATCH PATTERNS
      </Text>
      <WatchList items={watchPatterns.data?.items ?? []} />
    </Card>
  );

  const explanation = (
    <Card>
      <Text variant="label" tone="muted">
        HOW A SCORE IS MADE
      </Text>
      <Text tone="muted">{SCORE_EXPLANATION}</Text>
    </Card>
  );

  const rarity = (
    <Card>
      <Text variant="label" tone="muted">
        THE RARITY TABLE
      </Text>
      <ChoiceRow label="Serials counted" options={DOMAINS} value={domainLast} onChange={(value) => setDomainLast(Number(value))} testID="odds-domain" />
      <RarityTable lowLimit={draft.lowLimit} weightOf={weightOf} domainLast={domainLast} />
    </Card>
  );

  return (
    <Screen title="Odds" subtitle="Exactly how rare each pattern is, and what it is worth to you." maxWidth={1280}>
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.column}>
            {rarity}
            {explanation}
          </View>
          <View style={styles.column}>
            {tablePicker}
            {editor}
            {preview}
            {watchCard}
          </View>
        </View>
      ) : (
        <>
          {tablePicker}
          {editor}
          {preview}
          {rarity}
          {watchCard}
          {explanation}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { flex: 1, gap: space.lg },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  newRow: { flexDirection: 'row', alignItems: 'flex-end', gap: space.sm },
  editorHead: { flexDirection: 'row', gap: space.sm },
  grow: { flex: 1 },
});
