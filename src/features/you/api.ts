import useSWR, { mutate } from 'swr';
import {
  IMPORT_CHUNK_ROWS,
  deviceSessionList,
  importRowsResponse,
  publicUser,
  type CreateHuntRequest,
  type ImportRow,
  type ImportRowsRequest,
  type ImportRowsResponse,
  type UpdateMeRequest,
} from '@shared/contracts';
import { api, apiBlob } from '@/lib/api/client';
import { createHunt, deleteHunt, revalidateHunts } from '../hunts/api';

export const updateMe = (body: UpdateMeRequest) => api('/me', { method: 'PATCH', body, schema: publicUser });
export const deleteMe = () => api('/me', { method: 'DELETE' });

export type ExportFile = 'hunts.csv' | 'scans.csv' | 'keepers.csv' | 'json';

/** The file as the server streams it, with the name it will be saved under. */
export async function downloadExport(file: ExportFile): Promise<{ name: string; blob: Blob }> {
  const blob = await apiBlob(`/export/${file}`);
  const day = new Date().toISOString().slice(0, 10);
  // The server's word for a logged note is "scan"; the person saving the file reads "notes".
  const kind = file === 'scans.csv' ? 'notes' : file.replace('.csv', '');
  return { name: file === 'json' ? `strapsift-export-${day}.json` : `strapsift-${kind}-${day}.csv`, blob };
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

/** Where an import goes: an open hunt, or a new one made for it. */
export type ImportTarget = { huntId: string } | { newHunt: { title: string; denomination: number } };

export interface ImportOutcome extends ImportRowsResponse {
  huntId: string | null;
  /** A new hunt that received nothing new is deleted again, so re-importing leaves no empty hunt. */
  removedEmptyHunt: boolean;
}

/** What the import job talks to; the real API by default, fakes in the tests. */
export interface ImportIo {
  createHunt(body: CreateHuntRequest): Promise<{ id: string }>;
  deleteHunt(id: string): Promise<unknown>;
  importRows(body: ImportRowsRequest): Promise<ImportRowsResponse>;
  refresh(): Promise<unknown>;
}

const apiIo: ImportIo = {
  createHunt,
  deleteHunt,
  importRows,
  refresh: () => Promise.all([revalidateHunts(), mutate((key) => typeof key === 'string' && key.startsWith('/keepers'))]),
};

/**
 * Sends checked rows in parts of IMPORT_CHUNK_ROWS, reporting progress after each part, and adds up
 * the server's answers. A new hunt is dated from the earliest row and sized at one strap per 100 rows.
 */
export async function runImport(
  rows: ImportRow[],
  target: ImportTarget,
  onProgress: (done: number, total: number) => void = () => undefined,
  io: ImportIo = apiIo,
): Promise<ImportOutcome> {
  let huntId: string;
  let created = false;
  if ('newHunt' in target) {
    const dates = rows.map((row) => row.date).filter((date): date is string => !!date).sort();
    const hunt = await io.createHunt({
      title: target.newHunt.title.trim() || 'Imported log',
      source: 'Imported from an old log',
      denomination: target.newHunt.denomination,
      plannedStraps: Math.min(400, Math.max(1, Math.ceil(rows.length / 100))),
      ...(dates[0] ? { startedAt: dates[0] } : {}),
    });
    huntId = hunt.id;
    created = true;
  } else {
    huntId = target.huntId;
  }
  const total: ImportOutcome = { stored: 0, duplicates: 0, keepers: 0, rejected: [], huntId, removedEmptyHunt: false };
  onProgress(0, rows.length);
  for (let i = 0; i < rows.length; i += IMPORT_CHUNK_ROWS) {
    const part = await io.importRows({ huntId, rows: rows.slice(i, i + IMPORT_CHUNK_ROWS) });
    total.stored += part.stored;
    total.duplicates += part.duplicates;
    total.keepers += part.keepers;
    total.rejected.push(...part.rejected);
    onProgress(Math.min(rows.length, i + IMPORT_CHUNK_ROWS), rows.length);
  }
  if (created && total.stored === 0) {
    await io.deleteHunt(huntId);
    total.huntId = null;
    total.removedEmptyHunt = true;
  }
  await io.refresh();
  return total;
}
