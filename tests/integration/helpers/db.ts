import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll } from "vitest";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";

/**
 * Gives the test file its own freshly migrated SQLite file (a real file, WAL mode) under a temp
 * folder that also serves as DATA_DIR (uploads, outbox). Call once at the top of a test file.
 */
export function useTestDatabase() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-test-"));
  process.env.DATA_DIR = dir;
  process.env.DATABASE_URL = `file:${path.join(dir, "test.db")}`;
  process.env.SESSION_SECRET = "test-secret";
  beforeAll(async () => {
    await migrateDatabase();
  });
  afterAll(() => {
    closeDb();
    fs.rmSync(dir, { recursive: true, force: true });
  });
  return { dir, db: getDb };
}
