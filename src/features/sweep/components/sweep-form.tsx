import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { PATTERN_IDS, PATTERN_NAMES, type PatternId } from '@shared/engine';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';
import { COUNT_PRESETS, parseSweepInput, presetOf, type CountPreset, type SweepRequest } from '../sweep-input';

const PATTERN_OPTIONS = PATTERN_IDS.map((id) => ({ value: id, label: PATTERN_NAMES[id] }));

interface SweepFormProps {
  onSweep(request: SweepRequest): void;
  busy?: boolean;
  initialSerial?: string;
}

/** First serial, a count and the patterns to look for; checked in full before anything runs. */
export function SweepForm({ onSweep, busy, initialSerial = '' }: SweepFormProps) {
  const [serialText, setSerialText] = useState(initialSerial);
  const [countText, setCountText] = useState('100');
  const [patterns, setPatterns] = useState<PatternId[]>([...PATTERN_IDS]);
  const [errors, setErrors] = useState<{ serial?: string; count?: string; patterns?: string }>({});

  const preset = presetOf(countText);
  const choosePreset = (value: CountPreset) => {
    const notes = COUNT_PRESETS.find((option) => option.value === value)?.notes;
    // "Other" keeps whatever was typed and leaves the field to the hunter.
    if (notes) setCountText(String(notes));
    setErrors((current) => ({ ...current, count: undefined }));
  };
  const toggle = (id: PatternId) => {
    setPatterns((current) => (current.includes(id) ? current.filter((other) => other !== id) : [...current, id]));
    setErrors((current) => ({ ...current, patterns: undefined }));
  };
  const run = () => {
    const parsed = parseSweepInput(serialText, countText, patterns);
    if (!parsed.ok) {
      setErrors(parsed.errors);
      return;
    }
    setErrors({});
    onSweep(parsed.request);
  };

  return (
    <View style={styles.form} role="form" aria-label="Sweep a run of serials" testID="sweep-form">
      <View style={styles.fields}>
        <View style={styles.serialField}>
          <Field
            label="First serial"
            value={serialText}
            onChangeText={(text) => {
              setSerialText(text);
              setErrors((current) => ({ ...current, serial: undefined }));
            }}
            placeholder="e.g. MB 12345600 A"
            autoCapitalize="characters"
            autoCorrect={false}
            error={errors.serial}
            hint="The lowest serial of the run; letters are optional."
            onSubmitEditing={run}
            testID="sweep-serial"
          />
        </View>
        <View style={styles.countField}>
          <Field
            label="Notes in sequence"
            value={countText}
            onChangeText={(text) => {
              setCountText(text);
              setErrors((current) => ({ ...current, count: undefined }));
            }}
            keyboardType="number-pad"
            error={errors.count}
            hint="Up to 10,000,000."
            onSubmitEditing={run}
            testID="sweep-count"
          />
        </View>
      </View>
      <ChoiceRow<CountPreset>
        label="How many"
        options={COUNT_PRESETS.map(({ value, label }) => ({ value, label }))}
        value={preset}
        onChange={choosePreset}
        testID="sweep-preset"
      />
      <ToggleGroup label="Look for" options={PATTERN_OPTIONS} selected={patterns} onToggle={toggle} testID="sweep-patterns" />
      {errors.patterns ? (
        <Text variant="caption" tone="danger" accessibilityRole="alert">
          {errors.patterns}
        </Text>
      ) : null}
      <Button label="Sweep" busy={busy} onPress={run} style={styles.run} testID="sweep-run" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  serialField: { flexGrow: 2, flexBasis: 260 },
  countField: { flexGrow: 1, flexBasis: 160 },
  run: { alignSelf: 'flex-start', minWidth: 160 },
});
