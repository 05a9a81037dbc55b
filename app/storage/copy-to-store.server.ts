/**
 * Moving from the local-disk store to S3 (`npm run files:to-s3`): copies every file of a folder
 * into the configured store under the same key, and checks each one by size and SHA-256 read back
 * from the store. A file already there with the same size and checksum is left alone, so running
 * it twice changes nothing; one that differs is written again.
 */
import crypto from "node:crypto";
import fs from "node:fs/promises";
import path from "node:path";
import { SAFE_KEY, type FileStore } from "./store.server";

export type CopyResult = {
  key: string;
  size: number;
  sha256: string;
  outcome: "copied" | "unchanged" | "failed";
  reason?: string;
};

/** SHA-256 (hex) and byte count of a stream, read piece by piece. */
async function digest(body: AsyncIterable<Uint8Array>): Promise<{ sha256: string; size: number }> {
  const hash = crypto.createHash("sha256");
  let size = 0;
  for await (const chunk of body) {
    hash.update(chunk);
    size += chunk.byteLength;
  }
  return { sha256: hash.digest("hex"), size };
}

/** The store's copy's size and checksum, or null when it has none. */
async function stored(store: FileStore, key: string) {
  const opened = await store.open(key);
  return opened ? digest(opened.body) : null;
}

/** Keys of the folder's files ("club/uuid.png"), without the ".tmp" leftovers of killed writes. */
export async function folderKeys(folder: string): Promise<string[]> {
  const names = await fs.readdir(folder, { recursive: true });
  const keys: string[] = [];
  for (const name of names) {
    const key = name.split(path.sep).join("/");
    if (!SAFE_KEY.test(key) || key.includes("..") || key.endsWith(".tmp")) continue;
    if ((await fs.stat(path.join(folder, name))).isFile()) keys.push(key);
  }
  return keys.sort();
}

/** Copies and checks every file of `folder` into `store`; one result per file. */
export async function copyFolderToStore(folder: string, store: FileStore): Promise<CopyResult[]> {
  const results: CopyResult[] = [];
  for (const key of await folderKeys(folder)) {
    const bytes = new Uint8Array(await fs.readFile(path.join(folder, key)));
    const local = { size: bytes.byteLength, sha256: crypto.createHash("sha256").update(bytes).digest("hex") };
    const before = await stored(store, key);
    if (before && before.size === local.size && before.sha256 === local.sha256) {
      results.push({ key, ...local, outcome: "unchanged" });
      continue;
    }
    await store.put(key, bytes);
    const after = await stored(store, key);
    const ok = after && after.size === local.size && after.sha256 === local.sha256;
    results.push({
      key,
      ...local,
      outcome: ok ? "copied" : "failed",
      reason: ok
        ? undefined
        : after
          ? `read back ${after.size} bytes, sha256 ${after.sha256}`
          : "not found after the copy",
    });
  }
  return results;
}
