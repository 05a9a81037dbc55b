/**
 * Global set-up of the reliability tests: a temporary DATA_DIR with a migrated SQLite file and the
 * demo data, the fake SMTP server, the fake S3 server, and the built app served by the project's own server entry
 * (built first when its sources changed), as in production (NODE_ENV=production). Everything is
 * stopped and removed at the end.
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
    serverPid: number;
  }
}

export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-reliability-"));
  process.env.DATA_DIR = dataDir;
  delete process.env.DATABASE_URL;
  await migrateDatabase();
  await seedDemoData(await getDb());
  closeDb();

  const built = buildApp({ quiet: true });
  if (built !== null) console.log(`[reliability] built the app in ${built.toFixed(1)} s`);

  const smtp = await startFakeSmtp({ port: 0, dir: path.join(dataDir, "outbox") });
  const s3 = await startFakeS3({ port: 0, dir: path.join(dataDir, "s3") });
  const port = await freePort();
  const app = await startAppServer({
    port,
    output: "ignore",
    env: {
      NODE_ENV: "production",
      LOFTLINE_INSECURE_COOKIE: "1",
      LOFTLINE_REQUEST_LOG: "0",
      DATA_DIR: dataDir,
      DATABASE_URL: `file:${path.join(dataDir, "loftline.db")}`,
      SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
      ...s3.env,
      APP_URL: `http://localhost:${port}`,
      SESSION_SECRET: "reliability-session-secret",
    },
  }).catch(async (error) => {
    await Promise.all([smtp.close(), s3.close()]);
    throw error;
  });

  project.provide("baseUrl", app.url);
  project.provide("dataDir", dataDir);
  project.provide("serverPid", app.child.pid ?? 0);

  return async () => {
    await app.stop();
    await Promise.all([smtp.close(), s3.close()]);
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
