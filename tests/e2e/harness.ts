/**
 * Global set-up of the browser tests: for the whole run, a fresh temporary DATA_DIR with a migrated
 * SQLite file and the demo data, the local fake SMTP and S3 servers on free ports and the built app (built
 * first when its sources changed) on another free port, with the same environment as `npm run demo`.
 * Everything is stopped and the folder removed at the end.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { seedDemoData } from "~/db/demo-data.server";
import { startFakeSmtp } from "~/mail/fake-smtp.server";
import { startFakeS3 } from "~/storage/fake-s3.server";
import { buildApp, freePort, startAppServer } from "../../scripts/lib/app-server";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
  }
}

export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-e2e-"));
  process.env.DATA_DIR = dataDir;
  delete process.env.DATABASE_URL; // always the temporary file, never a configured server
  await migrateDatabase();
  await seedDemoData(await getDb());
  closeDb();

  const built = buildApp({ quiet: true });
  if (built !== null) console.log(`[e2e] built the app in ${built.toFixed(1)} s`);

  const smtp = await startFakeSmtp({ port: 0, dir: path.join(dataDir, "outbox") });
  const s3 = await startFakeS3({ port: 0, dir: path.join(dataDir, "s3") });
  const port = await freePort();
  const app = await startAppServer({
    port,
    output: "ignore",
    env: {
      NODE_ENV: "production",
      LOFTLINE_DEMO: "1",
      LOFTLINE_INSECURE_COOKIE: "1",
      DATA_DIR: dataDir,
      DATABASE_URL: `file:${path.join(dataDir, "loftline.db")}`,
      SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
      ...s3.env,
      APP_URL: `http://localhost:${port}`,
      SESSION_SECRET: "e2e-session-secret",
    },
  }).catch(async (error) => {
    await Promise.all([smtp.close(), s3.close()]);
    throw error;
  });

  project.provide("baseUrl", app.url);
  project.provide("dataDir", dataDir);

  return async () => {
    await app.stop();
    await Promise.all([smtp.close(), s3.close()]);
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
