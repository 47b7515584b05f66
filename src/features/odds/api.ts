import { useEffect } from 'react';
import useSWR, { mutate } from 'swr';
import { DEFAULT_WEIGHTS, type WatchPattern, type WeightTable } from '@shared/engine';
import {
  watchList,
  weightTableList,
  weightTableView,
  watchView,
  type CreateWatchRequest,
  type CreateWeightTableRequest,
  type ReplaceWeightTableRequest,
  type WatchList,
  type WeightTableList,
} from '@shared/contracts';
import { api } from '@/lib/api/client';
import { kv } from '@/lib/storage/kv';

export const oddsKeys = { weights: '/weights', watch: '/watch' };

// The keypad reads offline too, so the last tables the server sent are kept on the device.
const CACHE = { weights: 'strapsift.cache.weights', watch: 'strapsift.cache.watch' };

function useCachedSWR<T>(key: string, cacheKey: string, fetcher: (path: string) => Promise<T>) {
  const result = useSWR(key, fetcher);
  const cached = useSWR(`cache:${cacheKey}`, () => kv.get<T>(cacheKey), { revalidateOnFocus: false });
  useEffect(() => {
    if (result.data) void kv.set(cacheKey, result.data);
  }, [result.data, cacheKey]);
  return { ...result, data: result.data ?? cached.data ?? undefined };
}

export function useWeightTables() {
  return useCachedSWR<WeightTableList>(oddsKeys.weights, CACHE.weights, (path) => api(path, { schema: weightTableList }));
}

export function useWatchPatterns() {
  return useCachedSWR<WatchList>(oddsKeys.watch, CACHE.watch, (path) => api(path, { schema: watchList }));
}

/** The table the keypad scores with: the active one, else the last known, else the engine's defaults. */
export function useActiveWeights(): WeightTable {
  const { data } = useWeightTables();
  return (data?.items.find((table) => table.active)?.weights as WeightTable | undefined) ?? DEFAULT_WEIGHTS;
}

export function useWatchForReading(): WatchPattern[] {
  const { data } = useWatchPatterns();
  return (data?.items ?? []).map((item) => ({ ...item.pattern, ...(item.label ? { label: item.label } : {}) }) as WatchPattern);
}

export async function createWeightTable(body: CreateWeightTableRequest) {
  const table = await api('/weights', { method: 'POST', body, schema: weightTableView });
  await mutate(oddsKeys.weights);
  return table;
}

export async function replaceWeightTable(id: string, body: ReplaceWeightTableRequest) {
  const table = await api(`/weights/${id}`, { method: 'PUT', body, schema: weightTableView });
  await mutate(oddsKeys.weights);
  return table;
}

export async function activateWeightTable(id: string) {
  await api(`/weights/${id}/activate`, { method: 'POST' });
  await mutate(oddsKeys.weights);
}

export async function createWatch(body: CreateWatchRequest) {
  const item = await api('/watch', { method: 'POST', body, schema: watchView });
  await mutate(oddsKeys.watch);
  return item;
}

export async function deleteWatch(id: string) {
  await api(`/watch/${id}`, { method: 'DELETE' });
  await mutate(oddsKeys.watch);
}
