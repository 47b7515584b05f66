import useSWR from 'swr';
import { inviteAccepted, invitePreview } from '@shared/contracts';
import { api } from '@/lib/api/client';

/** What the invitation is for; readable before signing in. */
export function useInvitePreview(token: string | null) {
  return useSWR(token ? `/invites/${token}` : null, (path: string) => api(path, { anonymous: true, schema: invitePreview }), {
    shouldRetryOnError: false,
  });
}

export const acceptInvite = (token: string) => api(`/invites/${token}/accept`, { method: 'POST', schema: inviteAccepted });
