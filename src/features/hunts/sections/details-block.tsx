import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { HuntDetail } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SectionCard } from '@/components/ui/section-card';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { space } from '@/theme/tokens';
import { updateHunt } from '../api';
import { HuntNotesFields, noteOrderOf, seriesOrNull, type NoteOrder } from '../components/hunt-notes-fields';

const orderLabel = (inSequence: boolean) => (inSequence ? 'new, in sequence' : 'circulated, in no order');

/**
 * What the hunt is: its title, where the notes came from, their series and whether they are new notes
 * in sequence. Often only known once the strap is open, so the owner can set them after starting.
 */
export function DetailsBlock({ hunt, onSaved }: { hunt: HuntDetail; onSaved?: (hunt: HuntDetail) => void }) {
  const [editing, setEditing] = useState(false);
  const [title, setTitle] = useState(hunt.title);
  const [source, setSource] = useState(hunt.source);
  const [series, setSeries] = useState(hunt.series ?? '');
  const [order, setOrder] = useState<NoteOrder>(noteOrderOf(hunt.inSequence));
  const [saved, setSaved] = useState(false);
  const saving = useSubmit(async () => {
    const next = await updateHunt(hunt.id, {
      title: title.trim() || hunt.title,
      source: source.trim(),
      inSequence: order === 'sequence',
      series: seriesOrNull(series),
    });
    onSaved?.(next);
    setEditing(false);
    setSaved(true);
  });

  const owner = hunt.role === 'owner';
  const summary = (
    <View style={styles.lines} testID="hunt-details">
      <Text>
        <Text tone="muted">Notes: </Text>
        {orderLabel(hunt.inSequence)}
      </Text>
      <Text>
        <Text tone="muted">Series: </Text>
        {hunt.series ?? 'not given'}
      </Text>
      <Text>
        <Text tone="muted">From: </Text>
        {hunt.source || 'not given'}
      </Text>
    </View>
  );

  if (!owner || !editing) {
    return (
      <SectionCard
        title="Details"
        testID="details-section"
        actions={
          owner ? (
            <Button
              compact
              kind="secondary"
              label="Edit"
              accessibilityLabel="Edit the hunt's details"
              onPress={() => {
                setSaved(false);
                setEditing(true);
              }}
              testID="edit-details"
            />
          ) : undefined
        }
      >
        {saved ? <Notice tone="ok">Saved. Readings and the chance figures use the new details.</Notice> : null}
        {summary}
      </SectionCard>
    );
  }

  return (
    <SectionCard title="Details" testID="details-section">
      {saving.message ? <Notice tone="error">{saving.message}</Notice> : null}
      <Field label="Title" value={title} onChangeText={setTitle} error={saving.fields.title} testID="details-title" />
      <Field label="Where the notes came from (optional)" value={source} onChangeText={setSource} error={saving.fields.source} testID="details-source" />
      <HuntNotesFields order={order} onOrder={setOrder} series={series} onSeries={setSeries} seriesError={saving.fields.series} testPrefix="details" />
      <View style={styles.actions}>
        <Button label="Save details" busy={saving.busy} onPress={() => void saving.submit()} testID="save-details" />
        <Button
          kind="secondary"
          label="Cancel"
          onPress={() => {
            setTitle(hunt.title);
            setSource(hunt.source);
            setSeries(hunt.series ?? '');
            setOrder(noteOrderOf(hunt.inSequence));
            saving.setMessage(null);
            setEditing(false);
          }}
        />
      </View>
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  lines: { gap: space.xs },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
