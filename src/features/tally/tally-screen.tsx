import { router } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { Stat, StatRow } from '@/components/ui/stat';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { usePeriodTally, type PeriodQuery } from './api';
import { ChanceSection } from './components/chance-section';
import { RateSection, type RateRow } from './components/rate-section';
import { formatCount, formatDate, formatRate, formatShortDate } from './format';
import { PERIOD_CHOICES, bucketLabel, fillBuckets, parseCustomPeriod, presetFrom, type PeriodChoice } from './period';

const BUCKETS = [
  { value: 'week', label: 'By week' },
  { value: 'month', label: 'By month' },
] as const;

export function TallyScreen() {
  const theme = useTheme();
  const { isWide } = useLayout();
  const [choice, setChoice] = useState<PeriodChoice>('12m');
  const [bucket, setBucket] = useState<'week' | 'month'>('month');
  // Typed dates stay as typed; only a checked pair is applied to the query.
  const [fromText, setFromText] = useState('');
  const [toText, setToText] = useState('');
  const [custom, setCustom] = useState<{ from?: string; to?: string }>({});
  const [dateErrors, setDateErrors] = useState<{ from?: string; to?: string }>({});

  const query: PeriodQuery = choice === 'custom' ? { ...custom, bucket } : { from: presetFrom(choice), bucket };
  const { data, error, isLoading, mutate } = usePeriodTally(query);

  const applyDates = () => {
    const parsed = parseCustomPeriod(fromText, toText);
    if (!parsed.ok) {
      setDateErrors(parsed.errors);
      return;
    }
    setDateErrors({});
    setCustom({ from: parsed.from, to: parsed.to });
  };

  const byHunt: RateRow[] = (data?.byHunt ?? []).map((row) => ({
    key: row.huntId,
    label: formatShortDate(row.startedAt),
    name: row.title,
    detail: formatDate(row.startedAt),
    notes: row.notes,
    hits: row.hits,
    perThousand: row.perThousand,
  }));
  const overTime: RateRow[] = (data?.overTime ?? []).map((row) => ({
    key: row.start,
    label: bucketLabel(row.start, bucket, true),
    name: bucket === 'week' ? `Week of ${bucketLabel(row.start, 'week')}` : bucketLabel(row.start, 'month'),
    notes: row.notes,
    hits: row.hits,
    perThousand: row.perThousand,
  }));

  // The chart keeps weeks or months without notes as gaps; the table lists only those with notes.
  const overTimeBars = fillBuckets(data?.overTime ?? [], bucket).map((row) => ({
    key: row.start,
    label: bucketLabel(row.start, bucket, true),
    value: 'empty' in row ? 0 : row.perThousand,
  }));

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

      {isLoading ? (
        <View style={styles.loading} accessibilityLabel="Loading the tally">
          <ActivityIndicator color={theme.brand} />
          <Text tone="muted">Counting…</Text>
        </View>
      ) : error && !data ? (
        <View style={styles.gap}>
          <Notice tone="error" title="The tally could not be loaded">
            {error instanceof Error ? error.message : 'Something went wrong.'}
          </Notice>
          <Button kind="secondary" label="Try again" onPress={() => void mutate()} style={styles.alignStart} />
        </View>
      ) : data && data.notes === 0 ? (
        <Notice tone="info" title="No notes in this period" >
          Notes you log on the Sift tab are counted here. Choose a longer period, or All time.
        </Notice>
      ) : data ? (
        <>
          <StatRow>
            <Stat label="Notes searched" value={formatCount(data.notes)} testID="tally-notes" />
            <Stat label="Finds" value={formatCount(data.hits)} tone={data.hits ? 'hit' : 'ink'} />
            <Stat label="Per 1,000 notes" value={formatRate(data.perThousand)} testID="tally-rate" />
            <Stat label="Pulled" value={formatCount(data.pulled)} hint={`${formatCount(data.keeps)} scored as keepers`} />
            <Stat label="Read by camera" value={formatCount(data.entered.camera)} hint={`${formatCount(data.entered.keypad)} typed on the keypad`} testID="tally-entry" />
          </StatRow>
          <SectionCard
            title="Per pattern, against chance"
            subtitle={`Low serials counted up to ${formatCount(data.lowLimit)}, your low limit.`}
            testID="tally-patterns"
          >
            <ChanceSection figures={data} wide={isWide} testID="tally-chance" />
          </SectionCard>
          <SectionCard title="Per hunt" subtitle="Finds per 1,000 notes in each hunt of the period." testID="tally-hunts">
            <RateSection what="hunts" firstHeader="Hunt" rows={byHunt} average={data.perThousand} wide={isWide} testID="tally-by-hunt" />
          </SectionCard>
          <SectionCard
            title="Over time"
            subtitle={`Finds per 1,000 notes ${bucket === 'week' ? 'each week (from Monday)' : 'each month'}, by the day a note was logged.`}
            testID="tally-time"
          >
            <RateSection
              what={bucket === 'week' ? 'weeks' : 'months'}
              firstHeader={bucket === 'week' ? 'Week' : 'Month'}
              rows={overTime}
              chartData={overTimeBars}
              average={data.perThousand}
              wide={isWide}
              testID="tally-over-time"
            />
          </SectionCard>
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  controls: { gap: space.md },
  controlsWide: { flexDirection: 'row', gap: space.xl, flexWrap: 'wrap' },
  dates: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'flex-start' },
  dateField: { flexGrow: 1, flexBasis: 150 },
  dateButton: { marginTop: 22 },
  loading: { alignItems: 'center', gap: space.sm, paddingVertical: space.xxl },
  gap: { gap: space.md },
  alignStart: { alignSelf: 'flex-start' },
});
