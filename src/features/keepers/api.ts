import useSWR, { mutate } from 'swr';
import {
  keeperDetail,
  keeperList,
  photoView,
  shareLinkView,
  shareStatus,
  type CreateKeeperRequest,
  type KeeperListQuery,
  type PhotoSide,
  type UpdateKeeperRequest,
} from '@shared/contracts';
import { api } from '@/lib/api/client';

export const keeperKeys = {
  list: (query: Partial<KeeperListQuery> = {}) => {
    const params = new URLSearchParams();
    for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
    const text = params.toString();
    return text ? `/keepers?${text}` : '/keepers';
  },
  detail: (id: string) => `/keepers/${id}`,
};

const revalidateKeepers = () => mutate((key) => typeof key === 'string' && key.startsWith('/keepers'));

export function useKeepers(query: Partial<KeeperListQuery> = {}) {
  return useSWR(keeperKeys.list(query), (path: string) => api(path, { schema: keeperList }));
}

export function useKeeper(id: string | null) {
  return useSWR(id ? keeperKeys.detail(id) : null, (path: string) => api(path, { schema: keeperDetail }));
}

export async function createKeeper(body: CreateKeeperRequest) {
  const keeper = await api('/keepers', { method: 'POST', body, schema: keeperDetail });
  await revalidateKeepers();
  return keeper;
}

export async function updateKeeper(id: string, body: UpdateKeeperRequest) {
  const keeper = await api(`/keepers/${id}`, { method: 'PATCH', body, schema: keeperDetail });
  await revalidateKeepers();
  return keeper;
}

export async function deleteKeeper(id: string) {
  await api(`/keepers/${id}`, { method: 'DELETE' });
  await revalidateKeepers();
}

export const photoKeys = {
  /** Cache key of a photo's bytes as an object URL (web) — one per API path. */
  bytes: (path: string) => ['photo-bytes', path] as const,
};

/** Uploads a front or back photo; the form is built per platform (photo-form.ts / photo-form.web.ts). */
export async function uploadPhoto(keeperId: string, side: PhotoSide, form: FormData) {
  form.append('side', side);
  const photo = await api(`/keepers/${keeperId}/photos`, { method: 'POST', rawBody: form, schema: photoView });
  await revalidateKeepers();
  return photo;
}

export async function deletePhoto(keeperId: string, photoId: string) {
  await api(`/keepers/${keeperId}/photos/${photoId}`, { method: 'DELETE' });
  await revalidateKeepers();
}

export const shareKey = (keeperId: string) => `/keepers/${keeperId}/share`;

export function useShareStatus(keeperId: string | null) {
  return useSWR(keeperId ? shareKey(keeperId) : null, (path: string) => api(path, { schema: shareStatus }));
}

/** A new link (the old one, if any, stops working); its address is in this answer only. */
export async function createShareLink(keeperId: string) {
  const link = await api(shareKey(keeperId), { method: 'POST', schema: shareLinkView });
  await mutate(shareKey(keeperId));
  return link;
}

export async function revokeShareLink(keeperId: string) {
  await api(shareKey(keeperId), { method: 'DELETE' });
  await mutate(shareKey(keeperId));
}
