import fs from "node:fs";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import { migrate } from "drizzle-orm/libsql/migrator";
import { config } from "~/lib/config.server";
import * as schema from "./schema";
import { serialiseClient } from "./serialise.server";

export type Database = LibSQLDatabase<typeof schema>;

let client: Client | undefined;
let database: Database | undefined;
let ready: Promise<void> | undefined;

function open(): { client: Client; database: Database } {
  if (client && database) return { client, database };
  const url = config.databaseUrl;
  if (url.startsWith("file:")) {
    // The data folder must exist before libSQL opens the file.
    fs.mkdirSync(path.dirname(url.slice("file:".length)), { recursive: true });
  }
  // The busy timeout goes on the client: a PRAGMA would reach only one pooled connection.
  const raw = createClient({ url, authToken: process.env.DATABASE_AUTH_TOKEN, timeout: 5000 });
  // A local file is driven synchronously: queue its statements (see serialise.server.ts). A libSQL
  // server handles concurrency itself.
  client = url.startsWith("file:") ? serialiseClient(raw) : raw;
  database = drizzle(client, { schema });
  return { client, database };
}

/** Sets the pragmas a local file needs (WAL persists in the file; foreign keys per connection). */
async function prepare(c: Client) {
  if (config.databaseUrl.startsWith("file:")) {
    await c.execute("PRAGMA journal_mode = WAL");
  }
  await c.execute("PRAGMA foreign_keys = ON");
}

/** The app's one database handle. Awaits the connection pragmas on first use. */
export async function getDb(): Promise<Database> {
  const { client: c, database: d } = open();
  ready ??= prepare(c);
  await ready;
  return d;
}

/** Applies the committed migrations in ./drizzle to the configured database. */
export async function migrateDatabase(): Promise<void> {
  const db = await getDb();
  await migrate(db, { migrationsFolder: path.resolve("drizzle") });
}

/** Closes the client (scripts and tests). */
export function closeDb(): void {
  client?.close();
  client = undefined;
  database = undefined;
  ready = undefined;
}
