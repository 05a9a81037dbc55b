/**
 * `npm run db:migrate`: applies the committed migrations in ./drizzle to the configured database
 * (DATABASE_URL, or a SQLite file under DATA_DIR; the data folder is created when missing).
 */
import { closeDb, migrateDatabase } from "~/db/client.server";
import { config } from "~/lib/config.server";

try {
  await migrateDatabase();
  console.log(`Migrated ${redact(config.databaseUrl)}`);
} catch (error) {
  console.error(`Migration failed for ${redact(config.databaseUrl)}: ${(error as Error).message}`);
  process.exitCode = 1;
} finally {
  closeDb();
}

/** Hides credentials that a libSQL URL may carry in its query string. */
function redact(url: string): string {
  return url.replace(/(authToken|token)=[^&]+/gi, "$1=***");
}
