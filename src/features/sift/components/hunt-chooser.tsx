import { useEffect, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { DENOMINATIONS, type HuntSummary } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { countOf, formatCount, formatDate } from '@/lib/format';
import { kv } from '@/lib/storage/kv';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';
import { createHunt, useHunts } from '../../hunts/api';
import { HuntNotesFields, seriesOrNull, type NoteOrder } from '../../hunts/components/hunt-notes-fields';

const LAST_SOURCE = 'strapsift.sift.lastSource';
const LAST_DENOMINATION = 'strapsift.sift.lastDenomination';

export function defaultHuntTitle(now = new Date()): string {
  return formatDate(now, 'long');
}

const STRAP_CHOICES = [
  { value: 1, label: '1 strap' },
  { value: 5, label: '5' },
  { value: 10, label: 'Bundle · 10' },
  { value: 40, label: 'Brick · 40' },
] as const;

/** Continue an open hunt, or start today's in one tap with the source remembered from last time. */
export function HuntChooser({ onChosen, onCancel }: { onChosen(hunt: HuntSummary): void; onCancel?: () => void }) {
  const theme = useTheme();
  const { data, error, isLoading } = useHunts('open');
  const [title, setTitle] = useState(defaultHuntTitle());
  const [source, setSource] = useState('');
  const [denomination, setDenomination] = useState<number>(1);
  const [plannedStraps, setPlannedStraps] = useState<number>(10);
  const [order, setOrder] = useState<NoteOrder>('circulated');
  const [series, setSeries] = useState('');

  useEffect(() => {
    void kv.get<string>(LAST_SOURCE).then((saved) => saved && setSource(saved));
    void kv.get<number>(LAST_DENOMINATION).then((saved) => saved && setDenomination(saved));
  }, []);

  const { submit, busy, message, fields } = useSubmit(async () => {
    const hunt = await createHunt({
      title: title.trim() || defaultHuntTitle(),
      source: source.trim(),
      denomination,
      plannedStraps,
      inSequence: order === 'sequence',
      // Readings then check each serial's prefix against the series (e.g. its series letter).
      series: seriesOrNull(series),
    });
    // Remembered once given; an empty source never wipes out the last one.
    if (source.trim()) await kv.set(LAST_SOURCE, source.trim());
    await kv.set(LAST_DENOMINATION, denomination);
    onChosen(hunt);
  });

  const open = data?.items ?? [];
  return (
    <View style={styles.wrap} testID="hunt-chooser">
      {open.length ? (
        <Card>
          <Text variant="label" tone="muted">
            CONTINUE A HUNT
          </Text>
          {open.map((hunt) => (
            <Pressable
              key={hunt.id}
              accessibilityRole="button"
              onPress={() => onChosen(hunt)}
              style={({ hovered }: { hovered?: boolean }) => [styles.huntRow, { borderColor: theme.line }, hovered && { backgroundColor: theme.surfaceSunken }]}
            >
              <View style={styles.huntText}>
                <Text bold>{hunt.title}</Text>
                <Text variant="caption" tone="muted">
                  {[hunt.source, `$${hunt.denomination}`, `${formatCount(hunt.notesSearched)} notes`, countOf(hunt.hits, 'find')].filter(Boolean).join(' · ')}
                  {hunt.role === 'crew' ? ` · crew of ${hunt.owner.displayName}` : ''}
                </Text>
              </View>
              <Text tone="brand" bold>
                ›
              </Text>
            </Pressable>
          ))}
        </Card>
      ) : null}
      {error && !data ? <Notice tone="caution">Hunts could not be loaded; you can still start one when the connection is back.</Notice> : null}
      <Card>
        <Text variant="label" tone="muted">
          START A HUNT
        </Text>
        {message ? <Notice tone="error">{message}</Notice> : null}
        <Field label="Title" value={title} onChangeText={setTitle} error={fields.title} testID="hunt-title" />
        <Field label="Where the notes came from (optional)" value={source} onChangeText={setSource} placeholder="e.g. the branch on Mill Street" error={fields.source} testID="hunt-source" />
        <ChoiceRow
          label="Face value"
          options={DENOMINATIONS.map((value) => ({ value, label: `$${value}` }))}
          value={denomination}
          onChange={(value) => setDenomination(Number(value))}
        />
        <ChoiceRow label="Planned straps" options={STRAP_CHOICES} value={plannedStraps} onChange={(value) => setPlannedStraps(Number(value))} />
        <HuntNotesFields order={order} onOrder={setOrder} series={series} onSeries={setSeries} seriesError={fields.series} testPrefix="hunt" />
        {fields.plannedStraps ? <Text tone="danger">Planned straps {fields.plannedStraps}</Text> : null}
        <View style={styles.actions}>
          <Button label="Start hunt" busy={busy} onPress={() => void submit()} testID="start-hunt" style={styles.grow} />
          {onCancel ? <Button kind="secondary" label="Cancel" onPress={onCancel} /> : null}
        </View>
        {isLoading ? (
          <Text variant="caption" tone="faint">
            Looking for open hunts…
          </Text>
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  huntRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderTopWidth: 1, paddingVertical: space.md, paddingHorizontal: space.xs, borderRadius: radius.sm },
  huntText: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', gap: space.sm },
  grow: { flex: 1 },
});
