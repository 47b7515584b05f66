import type { TableSummary } from './checksums';

/** What a backup folder holds, written last: a folder without it is an unfinished backup. */
export interface BackupManifest {
  format: 'strapsift-backup';
  version: 1;
  createdAt: string;
  database: { file: string; bytes: number; sha256: string; tables: Record<string, TableSummary> };
  bucket: { name: string; objects: Array<{ key: string; bytes: number; sha256: string; contentType: string }> };
}

export const MANIFEST = 'manifest.json';
export const DUMP = 'database.dump';
export const OBJECTS = 'objects';
