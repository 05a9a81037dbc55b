/**
 * The whole product on loopback for a test suite's global set-up (the browser tests and the
 * reliability tests): a fresh temporary DATA_DIR with a migrated SQLite file and the demo data,
 * the local fake SMTP and S3 servers on free ports, and the built app (built first when its
 * sources changed) served by the project's own server entry with NODE_ENV=production.
 * `stop()` stops everything and removes the folder.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { seedDemoData } from "~/db/demo-data.server";
import { startFakeSmtp } from "~/mail/fake-smtp.server";
import { startFakeS3 } from "~/storage/fake-s3.server";
import { buildApp, freePort, startAppServer } from "./app-server";

export interface TestStack {
  url: string;
  dataDir: string;
  /** The app server's process id. */
  pid: number;
  stop(): Promise<void>;
}

/**
 * @param name the suite's name, in the temporary folder's name, the session secret and the log.
 * @param env more of the app's environment (e.g. LOFTLINE_DEMO=1).
 */
export async function startTestStack(name: string, env: Record<string, string> = {}): Promise<TestStack> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), `loftline-${name}-`));
  process.env.DATA_DIR = dataDir;
  delete process.env.DATABASE_URL; // always the temporary file, never a configured server
  await migrateDatabase();
  await seedDemoData(await getDb());
  closeDb();

  const built = buildApp({ quiet: true });
  if (built !== null) console.log(`[${name}] built the app in ${built.toFixed(1)} s`);

  const smtp = await startFakeSmtp({ port: 0, dir: path.join(dataDir, "outbox") });
  const s3 = await startFakeS3({ port: 0, dir: path.join(dataDir, "s3") });
  const closeFakes = () => Promise.all([smtp.close(), s3.close()]);
  const port = await freePort();
  const app = await startAppServer({
    port,
    output: "ignore",
    env: {
      NODE_ENV: "production",
      LOFTLINE_INSECURE_COOKIE: "1",
      DATA_DIR: dataDir,
      DATABASE_URL: `file:${path.join(dataDir, "loftline.db")}`,
      SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
      ...s3.env,
      APP_URL: `http://localhost:${port}`,
      SESSION_SECRET: `${name}-session-secret`,
      ...env,
    },
  }).catch(async (error) => {
    await closeFakes();
    throw error;
  });

  return {
    url: app.url,
    dataDir,
    pid: app.child.pid ?? 0,
    stop: async () => {
      await app.stop();
      await closeFakes();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
