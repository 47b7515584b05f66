import useSWR from 'swr';
import { deviceSessionList, importRowsResponse, publicUser, type ImportRowsRequest, type UpdateMeRequest } from '@shared/contracts';
import { api, apiBlob } from '@/lib/api/client';

export const updateMe = (body: UpdateMeRequest) => api('/me', { method: 'PATCH', body, schema: publicUser });
export const deleteMe = () => api('/me', { method: 'DELETE' });

export type ExportFile = 'hunts.csv' | 'scans.csv' | 'keepers.csv' | 'json';

/** The file as the server streams it, with the name it will be saved under. */
export async function downloadExport(file: ExportFile): Promise<{ name: string; blob: Blob }> {
  const blob = await apiBlob(`/export/${file}`);
  const day = new Date().toISOString().slice(0, 10);
  return { name: file === 'json' ? `strapsift-export-${day}.json` : `strapsift-${file.replace('.csv', '')}-${day}.csv`, blob };
}

/** One part (≤ 500 rows) of an import. */
export const importRows = (body: ImportRowsRequest) => api('/import/rows', { method: 'POST', body, schema: importRowsResponse });

export const sessionKeys = { list: '/me/sessions' } as const;

/** The account's signed-in devices, newest use first. */
export function useDeviceSessions() {
  return useSWR(sessionKeys.list, (path: string) => api(path, { schema: deviceSessionList }));
}
export const endDeviceSession = (id: string) => api(`/me/sessions/${id}`, { method: 'DELETE' });
export const endAllSessions = () => api('/me/sessions/end-all', { method: 'POST' });
