/**
 * Removing uploaded files nothing uses (`npm run files:clean`, documented in DEVELOPERS.md). A file
 * is used while any saved version of any layout names it as its background photo (the only place
 * documents refer to files today: a new kind of reference must be added to USED_FILE_IDS). Files
 * younger than the grace period are kept: the editor uploads a photo before the director saves
 * the layout that uses it. Files on disk without a row (a server stopped between writing the file
 * and recording it, or a removed club) go too, after the same grace period.
 */
import { sql } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { fileStore } from "./storage.server";

/** Default grace period: files younger than this are kept, ms. */
export const CLEAN_UP_GRACE_MS = 24 * 60 * 60 * 1000;

/** The ids of every file a saved layout version refers to. */
const USED_FILE_IDS = sql`
  SELECT json_extract(document, '$.background.fileId') FROM layout_versions
  WHERE json_valid(document) AND json_extract(document, '$.background.fileId') IS NOT NULL`;

export interface RemovedFile {
  id: string;
  clubId: string;
  storageKey: string;
  size: number;
}

export interface CleanUpReport {
  /** Recorded files no version uses (removed, or that would be with dryRun). */
  unused: RemovedFile[];
  /** Their bytes. */
  bytes: number;
  /** Keys on disk with no row. */
  stray: string[];
  dryRun: boolean;
}

/**
 * Removes (or with `dryRun` only lists) the files no saved layout version uses and the stray files
 * on disk, older than `graceMs`.
 */
export async function cleanUpFiles(
  opts: { graceMs?: number; dryRun?: boolean; now?: number } = {},
): Promise<CleanUpReport> {
  const dryRun = opts.dryRun ?? false;
  const cutoff = (opts.now ?? Date.now()) - (opts.graceMs ?? CLEAN_UP_GRACE_MS);
  const db = await getDb();
  const unusedWhere = sql`created_at < ${cutoff} AND id NOT IN (${USED_FILE_IDS})`;
  // One statement checks and deletes, so a version saved meanwhile either counts or waits for it.
  const rows = dryRun
    ? await db.all<Record<string, unknown>>(
        sql`SELECT id, club_id, storage_key, size FROM files WHERE ${unusedWhere} ORDER BY created_at`,
      )
    : await db.all<Record<string, unknown>>(
        sql`DELETE FROM files WHERE ${unusedWhere} RETURNING id, club_id, storage_key, size`,
      );
  const unused: RemovedFile[] = rows.map((r) => ({
    id: String(r.id),
    clubId: String(r.club_id),
    storageKey: String(r.storage_key),
    size: Number(r.size),
  }));
  const store = fileStore();
  if (!dryRun) for (const file of unused) await store.delete(file.storageKey);

  const known = new Set(
    (await db.all<{ storage_key: string }>(sql`SELECT storage_key FROM files`)).map((r) => r.storage_key),
  );
  const stray = (await store.list())
    .filter((f) => !known.has(f.key) && f.modifiedMs < cutoff)
    .map((f) => f.key)
    .sort();
  if (!dryRun) for (const key of stray) await store.delete(key);
  return { unused, bytes: unused.reduce((sum, f) => sum + f.size, 0), stray, dryRun };
}
