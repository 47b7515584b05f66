import useSWR, { mutate } from 'swr';
import { keeperDetail, keeperList, type CreateKeeperRequest, type KeeperListQuery, type UpdateKeeperRequest } from '@shared/contracts';
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
