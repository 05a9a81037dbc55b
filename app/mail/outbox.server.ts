/**
 * The development outbox: every message the local fake SMTP server receives is kept as one JSON
 * file in `${DATA_DIR}/outbox/`. The outbox page, the demo and the tests read it from here.
 */
import fs from "node:fs/promises";
import path from "node:path";
import { config } from "~/lib/config.server";

export type OutboxMessage = {
  /** Sortable id: receipt time in ms, zero-padded, then a random suffix. Also the file name. */
  id: string;
  /** Envelope recipients (lower-cased), Bcc included. */
  to: string[];
  from: string;
  subject: string;
  text: string;
  /** The HTML part, or null when the message had none. */
  html: string | null;
  /** Receipt time, ISO 8601 (UTC). */
  date: string;
};

const ID_PATTERN = /^\d{13}-[a-z0-9]{8}$/;

/** The outbox folder (read from DATA_DIR at each call, so tests can point it elsewhere). */
export function outboxDir(): string {
  return path.join(config.dataDir, "outbox");
}

/** A new sortable message id. */
export function newMessageId(now = Date.now()): string {
  const suffix = crypto.randomUUID().replace(/-/g, "").slice(0, 8);
  return `${String(now).padStart(13, "0")}-${suffix}`;
}

/** Writes one message atomically (temporary file, then rename) so readers never see half a file. */
export async function saveOutboxMessage(message: OutboxMessage, dir = outboxDir()): Promise<void> {
  await fs.mkdir(dir, { recursive: true });
  const file = path.join(dir, `${message.id}.json`);
  const tmp = `${file}.tmp`;
  await fs.writeFile(tmp, JSON.stringify(message, null, 2));
  await fs.rename(tmp, file);
}

/** Every message, newest first; `limit` keeps only the newest ones. */
export async function listOutbox(opts: { limit?: number; dir?: string } = {}): Promise<OutboxMessage[]> {
  const dir = opts.dir ?? outboxDir();
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  const ids = names
    .filter((n) => n.endsWith(".json"))
    .map((n) => n.slice(0, -".json".length))
    .filter((id) => ID_PATTERN.test(id))
    .sort()
    .reverse()
    .slice(0, opts.limit ?? Infinity);
  const messages = await Promise.all(ids.map((id) => readOutboxMessage(id, dir)));
  return messages.filter((m): m is OutboxMessage => m !== null);
}

/** One message by id, or null (unknown or malformed ids never touch the file system). */
export async function readOutboxMessage(id: string, dir = outboxDir()): Promise<OutboxMessage | null> {
  if (!ID_PATTERN.test(id)) return null;
  try {
    return JSON.parse(await fs.readFile(path.join(dir, `${id}.json`), "utf8")) as OutboxMessage;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw err;
  }
}

/** Deletes every kept message; returns how many were removed. */
export async function clearOutbox(dir = outboxDir()): Promise<number> {
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return 0;
    throw err;
  }
  const files = names.filter((n) => n.endsWith(".json"));
  await Promise.all(files.map((n) => fs.rm(path.join(dir, n), { force: true })));
  return files.length;
}
