import type { PeriodTally } from '@shared/contracts';
import { Notice } from '@/components/ui/notice';
import { SectionCard } from '@/components/ui/section-card';
import { Stat, StatRow } from '@/components/ui/stat';
import { formatCount, formatDate, formatRate, formatShortDate } from '../format';
import { bucketLabel, fillBuckets } from '../period';
import { ChanceSection } from './chance-section';
import { RateSection, type RateRow } from './rate-section';

interface TallyFiguresProps {
  data: PeriodTally;
  bucket: 'week' | 'month';
  wide: boolean;
}

/** The tally of one period once it has loaded: the totals, then per pattern, per hunt and over time. */
export function TallyFigures({ data, bucket, wide }: TallyFiguresProps) {
  if (data.notes === 0) {
    return (
      <Notice tone="info" title="No notes in this period">
        Notes you log on the Sift tab are counted here. Choose a longer period, or All time.
      </Notice>
    );
  }

  const byHunt: RateRow[] = data.byHunt.map((row) => ({
    key: row.huntId,
    label: formatShortDate(row.startedAt),
    name: row.title,
    detail: formatDate(row.startedAt),
    notes: row.notes,
    hits: row.hits,
    perThousand: row.perThousand,
  }));
  const overTime: RateRow[] = data.overTime.map((row) => ({
    key: row.start,
    label: bucketLabel(row.start, bucket, true),
    name: bucket === 'week' ? `Week of ${bucketLabel(row.start, 'week')}` : bucketLabel(row.start, 'month'),
    notes: row.notes,
    hits: row.hits,
    perThousand: row.perThousand,
  }));
  // The chart keeps weeks or months without notes as gaps; the table lists only those with notes.
  const overTimeBars = fillBuckets(data.overTime, bucket).map((row) => ({
    key: row.start,
    label: bucketLabel(row.start, bucket, true),
    value: 'empty' in row ? 0 : row.perThousand,
  }));

  return (
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
        <ChanceSection figures={data} wide={wide} testID="tally-chance" />
      </SectionCard>
      <SectionCard title="Per hunt" subtitle="Finds per 1,000 notes in each hunt of the period." testID="tally-hunts">
        <RateSection what="hunts" firstHeader="Hunt" rows={byHunt} average={data.perThousand} wide={wide} testID="tally-by-hunt" />
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
          wide={wide}
          testID="tally-over-time"
        />
      </SectionCard>
    </>
  );
}
