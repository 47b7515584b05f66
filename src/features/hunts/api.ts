import useSWR, { mutate } from 'swr';
import useSWRInfinite, { unstable_serialize } from 'swr/infinite';
import {
  huntDetail,
  huntList,
  huntTally,
  inviteList,
  inviteView,
  mailSent,
  memberList,
  memberView,
  scanPage,
  strapRow,
  strapSheet,
  type AddMemberRequest,
  type CreateHuntRequest,
  type CreateInviteRequest,
  type InviteView,
  type HuntDetail,
  type HuntList,
  type MemberView,
  type ScanPage,
  type StrapRow,
  type UpdateHuntRequest,
  type UpdateStrapRequest,
} from '@shared/contracts';
import { api } from '@/lib/api/client';

export const huntKeys = {
  all: '/hunts',
  list: (status?: 'open' | 'closed') => (status ? `/hunts?status=${status}` : '/hunts'),
  detail: (id: string) => `/hunts/${id}`,
  straps: (id: string) => `/hunts/${id}/straps`,
  scans: (id: string) => `/hunts/${id}/scans`,
  tally: (id: string) => `/hunts/${id}/tally`,
  members: (id: string) => `/hunts/${id}/members`,
};

export type HuntFilter = 'open' | 'closed' | undefined;

const HUNT_PAGE_SIZE = 50;
/** Keys of the paged hunt list: one per page, each carrying the cursor the previous page ended on. */
export const huntPageKey = (status: HuntFilter) => (index: number, previous: HuntList | null) => {
  if (previous && !previous.nextCursor) return null;
  const query = new URLSearchParams({ limit: String(HUNT_PAGE_SIZE) });
  if (status) query.set('status', status);
  if (index > 0 && previous?.nextCursor) query.set('cursor', previous.nextCursor);
  return `/hunts?${query.toString()}`;
};

const SCAN_PAGE_SIZE = 200;
export const scanPageKey = (huntId: string | null) => (index: number, previous: ScanPage | null) => {
  if (!huntId || (previous && !previous.nextCursor)) return null;
  const query = new URLSearchParams({ limit: String(SCAN_PAGE_SIZE) });
  if (index > 0 && previous?.nextCursor) query.set('cursor', previous.nextCursor);
  return `/hunts/${huntId}/scans?${query.toString()}`;
};

/**
 * Revalidates every cached answer about hunts (lists, pages, sheets) after a change. SWR's key filter
 * skips paged (infinite) lists, so the hunt list's three filters are named here one by one.
 */
export const revalidateHunts = () =>
  Promise.all([
    mutate((key) => typeof key === 'string' && key.startsWith('/hunts')),
    ...([undefined, 'open', 'closed'] as const).map((status) => mutate(unstable_serialize(huntPageKey(status)))),
  ]);

export function useHunts(status?: 'open' | 'closed') {
  return useSWR(huntKeys.list(status), (path: string) => api(path, { schema: huntList }));
}

export function useHunt(id: string | null) {
  return useSWR(id ? huntKeys.detail(id) : null, (path: string) => api(path, { schema: huntDetail }));
}

/** Every hunt the caller belongs to, newest first, a page at a time. */
export function useHuntPages(status: HuntFilter) {
  return useSWRInfinite(huntPageKey(status), (path: string) => api(path, { schema: huntList }));
}

/**
 * A hunt's notes, newest first, 200 a page. The first `initialPages` are read one after another
 * (fewer when the hunt is smaller); the hits table asks for more as the hunter scrolls back.
 */
export function useHuntScans(id: string | null, initialPages = 5) {
  return useSWRInfinite(scanPageKey(id), (path: string) => api(path, { schema: scanPage }), { initialSize: initialPages });
}

export function useHuntTally(id: string | null) {
  return useSWR(id ? huntKeys.tally(id) : null, (path: string) => api(path, { schema: huntTally }));
}

export function useHuntMembers(id: string | null) {
  return useSWR(id ? huntKeys.members(id) : null, (path: string) => api(path, { schema: memberList }));
}

export function useStrapSheet(id: string | null) {
  return useSWR(id ? huntKeys.straps(id) : null, (path: string) => api(path, { schema: strapSheet }));
}

export async function createHunt(body: CreateHuntRequest): Promise<HuntDetail> {
  const hunt = await api('/hunts', { method: 'POST', body, schema: huntDetail });
  await revalidateHunts();
  return hunt;
}

export async function updateHunt(id: string, body: UpdateHuntRequest): Promise<HuntDetail> {
  const hunt = await api(`/hunts/${id}`, { method: 'PATCH', body, schema: huntDetail });
  await revalidateHunts();
  return hunt;
}

export async function closeHunt(id: string): Promise<HuntDetail> {
  const hunt = await api(`/hunts/${id}/close`, { method: 'POST', schema: huntDetail });
  await revalidateHunts();
  return hunt;
}

export async function deleteHunt(id: string): Promise<void> {
  await api(`/hunts/${id}`, { method: 'DELETE' });
  await revalidateHunts();
}

export async function updateStrap(huntId: string, strap: number, body: UpdateStrapRequest): Promise<StrapRow> {
  const row = await api(`/hunts/${huntId}/straps/${strap}`, { method: 'PATCH', body, schema: strapRow });
  await mutate(huntKeys.straps(huntId));
  return row;
}

/** Adds an existing account as crew (owner only). */
export async function addMember(huntId: string, body: AddMemberRequest): Promise<MemberView> {
  const member = await api(`/hunts/${huntId}/members`, { method: 'POST', body, schema: memberView });
  await Promise.all([mutate(huntKeys.members(huntId)), revalidateHunts()]);
  return member;
}

/** Takes a crew member off the hunt (owner only); the notes they logged stay in it. */
export async function removeMember(huntId: string, userId: string): Promise<void> {
  await api(`/hunts/${huntId}/members/${userId}`, { method: 'DELETE' });
  await Promise.all([mutate(huntKeys.members(huntId)), revalidateHunts()]);
}

export const inviteKeys = { list: (huntId: string) => `/hunts/${huntId}/invites` };

/** Open invitations of a hunt (owner only). */
export function useInvites(huntId: string | null) {
  return useSWR(huntId ? inviteKeys.list(huntId) : null, (path: string) => api(path, { schema: inviteList }));
}

/** Mails an invitation link; whoever accepts it joins as crew, with an account made on the spot if need be. */
export async function sendInvite(huntId: string, body: CreateInviteRequest): Promise<InviteView> {
  const invite = await api(`/hunts/${huntId}/invites`, { method: 'POST', body, schema: inviteView });
  await mutate(inviteKeys.list(huntId));
  return invite;
}

export async function withdrawInvite(huntId: string, inviteId: string): Promise<void> {
  await api(`/hunts/${huntId}/invites/${inviteId}`, { method: 'DELETE' });
  await mutate(inviteKeys.list(huntId));
}

/** The hunt's figures by mail, to the owner's own address. */
export const mailSummary = (huntId: string) => api(`/hunts/${huntId}/summary-mail`, { method: 'POST', schema: mailSent });
