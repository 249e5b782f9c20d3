// Types of backup.mjs for the API's TypeScript tests.
import type { MariaDBServer } from './mariadb.d.mts';

export interface Backup {
  dir: string;
  startedAt: string;
  finishedAt: string;
  binlog: { file: string; position: number; createdAt: number | null };
  tookMs: number;
}

export const defaultBackupsDir: string;
export function takeBackup(server: MariaDBServer, options?: { into?: string }): Backup;
export function findBackup(name: string, backupsDir?: string): Backup;
export function restoreBackup(
  server: MariaDBServer,
  backup: Backup,
  options: { port: number | string; until?: Date },
): Promise<{ setAside: string | null; replayed: boolean; tookMs: number }>;
