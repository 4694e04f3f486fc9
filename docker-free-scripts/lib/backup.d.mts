export interface BackupResult {
  path: string;
  bytes: number;
  tables: Record<string, number>;
  durationMs: number;
}
export function rowCounts(db: unknown): Record<string, number>;
export function verifyDatabaseFile(path: string): Record<string, number>;
export function backupDatabase(source: string, destination: string): Promise<BackupResult>;
export function restoreDatabase(
  backup: string,
  target: string,
  options?: { keepPrevious?: boolean },
): Promise<{ target: string; previous: string | null; tables: Record<string, number> }>;
