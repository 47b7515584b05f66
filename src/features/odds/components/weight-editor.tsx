import { StyleSheet, View } from 'react-native';
import { LOW_LIMITS, PATTERN_IDS, PATTERN_NAMES, type LowLimit } from '@shared/engine';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';
import { COUNT_TIMES, RUN_LENGTHS, type WeightDraft } from '../weight-draft';
import { NumberCell } from './number-cell';

interface WeightEditorProps {
  draft: WeightDraft;
  onChange(draft: WeightDraft): void;
  errors: Record<string, string>;
}

/** Every number a score is made of, grouped as the score explanation lists them. */
export function WeightEditor({ draft, onChange, errors }: WeightEditorProps) {
  return (
    <View style={styles.wrap} testID="weight-editor">
      <Text variant="label" tone="muted">
        POINTS PER PATTERN
      </Text>
      <View style={styles.grid}>
        {PATTERN_IDS.map((id) => (
          <NumberCell
            key={id}
            label={PATTERN_NAMES[id]}
            value={draft.patterns[id]}
            error={errors[`patterns.${id}`]}
            onChange={(text) => onChange({ ...draft, patterns: { ...draft.patterns, [id]: text } })}
          />
        ))}
      </View>
      <Text variant="label" tone="muted">
        LONGEST RUN OF ONE DIGIT
      </Text>
      <View style={styles.grid}>
        {RUN_LENGTHS.map((n) => (
          <NumberCell key={n} label={`run of ${n}`} value={draft.runs[n]} error={errors[`runs.${n}`]} onChange={(text) => onChange({ ...draft, runs: { ...draft.runs, [n]: text } })} />
        ))}
      </View>
      <Text variant="label" tone="muted">
        ONE DIGIT MANY TIMES
      </Text>
      <View style={styles.grid}>
        {COUNT_TIMES.map((n) => (
          <NumberCell key={n} label={`${n} times`} value={draft.counts[n]} error={errors[`counts.${n}`]} onChange={(text) => onChange({ ...draft, counts: { ...draft.counts, [n]: text } })} />
        ))}
      </View>
      <ChoiceRow
        label="Low limit (what counts as a low serial)"
        options={LOW_LIMITS.map((value) => ({ value, label: `≤ ${value.toLocaleString('en-US')}` }))}
        value={draft.lowLimit}
        onChange={(value) => onChange({ ...draft, lowLimit: Number(value) as LowLimit })}
      />
      <View style={styles.grid}>
        <NumberCell label="star bonus" value={draft.starBonus} error={errors.starBonus} onChange={(text) => onChange({ ...draft, starBonus: text })} />
        <NumberCell
          label="small star run"
          value={draft.smallStarRunBonus}
          error={errors.smallStarRunBonus}
          onChange={(text) => onChange({ ...draft, smallStarRunBonus: text })}
        />
        <NumberCell label="watch bonus" value={draft.watchBonus} error={errors.watchBonus} onChange={(text) => onChange({ ...draft, watchBonus: text })} />
        <NumberCell label="keep at ≥" value={draft.keepThreshold} error={errors.keepThreshold} onChange={(text) => onChange({ ...draft, keepThreshold: text })} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
