import useSWR, { mutate } from 'swr';
import { publicUser } from '@shared/contracts/auth';
import { archiveImportResult, archiveProgressLine, archiveSummary, type ArchiveImportResult, type ArchiveProgressLine } from '@shared/contracts/archive';
import { api, apiDownload, apiLines, ApiError } from '@/lib/api/client';

export const archiveKeys = { summary: '/export/archive/summary' };

/** How much the archive will hold, to size the download's progress bar. */
export function useArchiveSummary() {
  return useSWR(archiveKeys.summary, (path: string) => api(path, { schema: archiveSummary }));
}

export async function downloadArchive(onProgress: (received: number) => void): Promise<{ name: string; blob: Blob }> {
  const blob = await apiDownload('/export/archive', onProgress);
  return { name: `strapsift-archive-${new Date().toISOString().slice(0, 10)}.zip`, blob };
}

const form = (file: Blob, name: string) => {
  const body = new FormData();
  body.append('archive', file, name);
  return body;
};

/** The dry run: what a restore would add, what is already here, and any problems with the file. */
export const previewArchive = (file: File) => api('/import/archive?preview=1', { method: 'POST', rawBody: form(file, file.name), schema: archiveImportResult });

export type RestoreProgress = Extract<ArchiveProgressLine, { phase: string }>;

/** The restore itself, reporting each part as the server writes it. */
export async function restoreArchive(file: File, onProgress: (progress: RestoreProgress) => void): Promise<ArchiveImportResult> {
  let result: ArchiveImportResult | null = null;
  await apiLines('/import/archive', { method: 'POST', rawBody: form(file, file.name), schema: archiveProgressLine }, (line) => {
    if ('phase' in line) onProgress(line);
    else if ('result' in line) result = line.result;
    else throw new ApiError(500, line.error.code, line.error.message);
  });
  if (!result) throw new ApiError(500, 'restore_failed', 'The restore stopped before it finished; restoring again fills in the rest');
  return result;
}

/** After a restore every list may have changed (hunts, keepers, weights, the archive's own summary). */
export async function afterRestore() {
  await mutate(() => true);
  return api('/me', { schema: publicUser });
}
