import useSWR from 'swr';
import { sharedKeeper } from '@shared/contracts';
import { api } from '@/lib/api/client';

/** The shared note, read without a session: the link is the only key. */
export function useSharedKeeper(token: string | null) {
  return useSWR(token ? `/share/${token}` : null, (path: string) => api(path, { anonymous: true, schema: sharedKeeper }), {
    shouldRetryOnError: false,
    revalidateOnFocus: false,
  });
}
