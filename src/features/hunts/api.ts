import useSWR, { mutate } from 'swr';
import {
  huntDetail,
  huntList,
  strapSheet,
  type CreateHuntRequest,
  type HuntDetail,
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

/** Revalidates every cached answer about hunts (lists, pages, sheets) after a change. */
export const revalidateHunts = () => mutate((key) => typeof key === 'string' && key.startsWith('/hunts'));

export function useHunts(status?: 'open' | 'closed') {
  return useSWR(huntKeys.list(status), (path: string) => api(path, { schema: huntList }));
}

export function useHunt(id: string | null) {
  return useSWR(id ? huntKeys.detail(id) : null, (path: string) => api(path, { schema: huntDetail }));
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

export async function updateStrap(huntId: string, strap: number, body: UpdateStrapRequest): Promise<void> {
  await api(`/hunts/${huntId}/straps/${strap}`, { method: 'PATCH', body });
  await mutate(huntKeys.straps(huntId));
}
