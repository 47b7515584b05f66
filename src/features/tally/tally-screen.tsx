import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AsyncBlock } from '@/components/ui/async-block';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Screen } from '@/components/ui/screen';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { usePeriodTally, type PeriodQuery } from './api';
import { TallyFigures } from './components/tally-figures';
import { PERIOD_CHOICES, parseCustomPeriod, presetFrom, type PeriodChoice } from './period';

const BUCKETS = [
  { value: 'week', label: 'By week' },
  { value: 'month', label: 'By month' },
] as const;

export function TallyScreen() {
  const { isWide } = useLayout();
  const [choice, setChoice] = useState<PeriodChoice>('12m');
  const [bucket, setBucket] = useState<'week' | 'month'>('month');
  // Typed dates stay as typed; only a checked pair is applied to the query.
  const [fromText, setFromText] = useState('');
  const [toText, setToText] = useState('');
  const [custom, setCustom] = useState<{ from?: string; to?: string }>({});
  const [dateErrors, setDateErrors] = useState<{ from?: string; to?: string }>({});

  const query: PeriodQuery = choice === 'custom' ? { ...custom, bucket } : { from: presetFrom(choice), bucket };
  const { data, error, mutate } = usePeriodTally(query);

  const applyDates = () => {
    const parsed = parseCustomPeriod(fromText, toText);
    if (!parsed.ok) {
      setDateErrors(parsed.errors);
      return;
    }
    setDateErrors({});
    setCustom({ from: parsed.from, to: parsed.to });
  };

  return (
    <Screen
      title="Tally"
      subtitle="Your find rate against what chance predicts for the same number of notes."
      maxWidth={1320}
      actions={<Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={() => router.push('/hunts')} testID="tally-to-hunts" />}
    >
      <View style={[styles.controls, isWide && styles.controlsWide]}>
        <ChoiceRow<PeriodChoice> label="Period" options={PERIOD_CHOICES} value={choice} onChange={setChoice} testID="tally-period" />
        <ChoiceRow<'week' | 'month'> label="Over time" options={BUCKETS} value={bucket} onChange={setBucket} testID="tally-bucket" />
      </View>
      {choice === 'custom' ? (
        <View style={styles.dates} role="form" aria-label="Dates of the period">
          <View style={styles.dateField}>
            <Field label="From" value={fromText} onChangeText={setFromText} placeholder="2026-01-01" error={dateErrors.from} testID="tally-from" />
          </View>
          <View style={styles.dateField}>
            <Field label="To" value={toText} onChangeText={setToText} placeholder="2026-03-31" error={dateErrors.to} testID="tally-to" />
          </View>
          <Button label="Show" onPress={applyDates} style={styles.dateButton} testID="tally-apply" />
        </View>
      ) : null}

      <AsyncBlock what="tally" data={data} error={error} retry={() => void mutate()}>
        {(tally) => <TallyFigures data={tally} bucket={bucket} wide={isWide} />}
      </AsyncBlock>
    </Screen>
  );
}

const styles = StyleSheet.create({
  controls: { gap: space.md },
  controlsWide: { flexDirection: 'row', gap: space.xl, flexWrap: 'wrap' },
  dates: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'flex-start' },
  dateField: { flexGrow: 1, flexBasis: 150 },
  dateButton: { marginTop: 22 },
});
