import useSWR from 'swr';
import { periodTally } from '@shared/contracts';
import { api } from '@/lib/api/client';

export interface PeriodQuery {
  /** ISO dates (whole UTC days), both inclusive; omitted means open-ended. */
  from?: string;
  to?: string;
  bucket: 'week' | 'month';
}

export const tallyKeys = {
  period: ({ from, to, bucket }: PeriodQuery) => {
    const query = new URLSearchParams({ bucket });
    if (from) query.set('from', from);
    if (to) query.set('to', to);
    return `/tally?${query.toString()}`;
  },
};

/** Hits against chance over every hunt the caller belongs to, with series per hunt and over time. */
export function usePeriodTally(query: PeriodQuery) {
  return useSWR(tallyKeys.period(query), (path: string) => api(path, { schema: periodTally }));
}
