/**
 * The built app on a free loopback port with its own temporary data folder holding the demo data,
 * for the reliability tests (which stop or kill a real server process) and the load benchmarks.
 * Builds first when stale.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { seedDemoData } from "~/db/demo-data.server";
import { buildApp, freePort, startAppServer, type AppServer } from "./app-server";

export interface TestApp {
  base: string;
  dataDir: string;
  dbFile: string;
  /**
   * Starts the server (again) on the same data folder and port (or another port: a second process
   * on the same data, whose public address stays `base`), with extra environment.
   */
  start(env?: Record<string, string>, onPort?: number): Promise<AppServer>;
  remove(): void;
}

/** A fresh data folder with the demo data; the server is not started yet. */
export async function prepareApp(opts: { quiet?: boolean } = {}): Promise<TestApp> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-reliability-"));
  const dbFile = path.join(dataDir, "loftline.db");
  const saved = { DATA_DIR: process.env.DATA_DIR, DATABASE_URL: process.env.DATABASE_URL };
  process.env.DATA_DIR = dataDir;
  process.env.DATABASE_URL = `file:${dbFile}`;
  await migrateDatabase();
  await seedDemoData(await getDb());
  closeDb();
  Object.assign(process.env, saved);
  const built = buildApp({ quiet: true });
  if (built !== null && !opts.quiet) console.log(`built the app in ${built.toFixed(1)} s`);
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  return {
    base,
    dataDir,
    dbFile,
    start: (env = {}, onPort = port) =>
      startAppServer({
        port: onPort,
        output: "ignore",
        env: {
          NODE_ENV: "production",
          HOST: "127.0.0.1",
          LOFTLINE_DEMO: "1",
          LOFTLINE_INSECURE_COOKIE: "1",
          DATA_DIR: dataDir,
          DATABASE_URL: `file:${dbFile}`,
          SESSION_SECRET: "reliability-session-secret",
          APP_URL: base,
          ...env,
        },
      }),
    remove: () => fs.rmSync(dataDir, { recursive: true, force: true }),
  };
}

/** Signs in as a demo account of the role; returns the session cookie. */
export async function signIn(base: string, role: "director" | "marshal" | "driver"): Promise<string> {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
  const response = await fetch(`${base}/sign-in`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", Origin: base },
    body: new URLSearchParams({ email: account.email, password: account.password }).toString(),
  });
  const cookie = response.headers.get("set-cookie")?.split(";")[0];
  if (!cookie || response.status >= 400)
    throw new Error(`signing in as ${account.email}: ${response.status}`);
  return cookie;
}
