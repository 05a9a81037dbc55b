/**
 * `npm run demo`: the whole product on one machine, with the invented demo club.
 * Creates the data folder, migrates the SQLite file, adds the demo data (again harmlessly when it
 * is already there), builds the app when the sources changed, starts the local fake SMTP and S3
 * servers (files under DATA_DIR/s3) and the built app on http://localhost:3000, prints the demo
 * accounts, and stops them all on Ctrl-C. With S3_BUCKET or FILE_STORE set, the app uses that
 * store instead of the fake one.
 *
 *   npm run demo               keep the existing demo database, bring the demo data back
 *   npm run demo -- --reset    delete the demo database, outbox and uploads first and start over
 */
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { DEMO_CLUB_NAME, seedDemoData } from "~/db/demo-data.server";
import { startFakeSmtp, type FakeSmtp } from "~/mail/fake-smtp.server";
import { startFakeS3, type FakeS3 } from "~/storage/fake-s3.server";
import { buildApp, buildIsStale, startAppServer } from "./lib/app-server";

const USAGE = "Usage: npm run demo [-- --reset]";
const args = process.argv.slice(2);
if (args.includes("--help") || args.includes("-h")) {
  console.log(USAGE);
  process.exit(0);
}
const unknown = args.filter((a) => a !== "--reset");
if (unknown.length) {
  console.error(`Unknown option ${unknown.join(" ")}. ${USAGE}`);
  process.exit(2);
}
const reset = args.includes("--reset");

const dataDir = path.resolve(process.env.DATA_DIR ?? "./data");
const port = Number(process.env.PORT ?? 3000);
if (!Number.isInteger(port) || port <= 0 || port > 65535) {
  console.error(`PORT must be a whole number from 1 to 65535 (got "${process.env.PORT}").`);
  process.exit(2);
}
process.env.DATA_DIR = dataDir;
fs.mkdirSync(dataDir, { recursive: true });

if (reset) {
  if (process.env.DATABASE_URL) {
    console.error("--reset only deletes the local demo file; unset DATABASE_URL to use it.");
    process.exit(2);
  }
  for (const name of ["loftline.db", "loftline.db-wal", "loftline.db-shm", "outbox", "files", "s3"]) {
    fs.rmSync(path.join(dataDir, name), { recursive: true, force: true });
  }
  console.log(`Removed the demo database, outbox and uploaded files in ${dataDir}.`);
}

await migrateDatabase();
const summary = await seedDemoData(await getDb());
closeDb();
console.log(
  summary.created.club
    ? `Created the demo club "${DEMO_CLUB_NAME}".`
    : `The demo club "${DEMO_CLUB_NAME}" is already there; its demo accounts are back to their known passwords.`,
);

if (buildIsStale()) console.log("Building the app (a few seconds)...");
const buildSeconds = buildApp({ quiet: true });
console.log(
  buildSeconds === null ? "The build is up to date." : `Built the app in ${buildSeconds.toFixed(1)} s.`,
);

const smtp = await startSmtp();
const s3 = process.env.S3_BUCKET || process.env.FILE_STORE ? undefined : await startS3();
const closeFakes = () => Promise.all([smtp.close(), s3?.close()]);
const app = await startAppServer({
  port,
  env: {
    NODE_ENV: "production",
    LOFTLINE_DEMO: "1",
    LOFTLINE_INSECURE_COOKIE: "1", // plain http on localhost: a Secure cookie would never come back
    DATA_DIR: dataDir,
    SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
    ...s3?.env,
    APP_URL: process.env.APP_URL ?? `http://localhost:${port}`,
    SESSION_SECRET: process.env.SESSION_SECRET ?? demoSessionSecret(),
  },
}).catch(async (error: Error) => {
  await closeFakes();
  console.error(`Could not start the app on port ${port}: ${error.message}. Is something else using it?`);
  process.exit(1);
});

console.log(`
Loftline demo is running.
  App:     ${app.url}
  Outbox:  ${app.url}/outbox   (every e-mail the app sends lands here; SMTP on port ${smtp.port})
  Files:   ${s3 ? `fake S3 server on port ${s3.port} (bucket ${s3.bucket}, objects in ${s3.dir})` : "the configured store"}
  Data:    ${dataDir}

Demo accounts (${DEMO_CLUB_NAME}):
${DEMO_ACCOUNTS.map((a) => `  ${a.role.padEnd(9)} ${a.email.padEnd(24)} password: ${a.password}`).join("\n")}

Press Ctrl-C to stop.`);

let stopping = false;
async function stop(code: number) {
  if (stopping) return;
  stopping = true;
  await Promise.all([app.stop(), closeFakes()]);
  process.exit(code);
}
process.on("SIGINT", () => void stop(0));
process.on("SIGTERM", () => void stop(0));
app.child.once("exit", (code) => {
  if (!stopping) console.error(`The app server stopped (code ${code}).`);
  void stop(code ?? 1);
});

/** The usual port 2525, or any free one when something else holds it. */
async function startSmtp(): Promise<FakeSmtp> {
  try {
    return await startFakeSmtp({ port: 2525 });
  } catch {
    return startFakeSmtp({ port: 0 });
  }
}

/** The fake S3 server on its usual port 4568, or any free one when something else holds it. */
async function startS3(): Promise<FakeS3> {
  const dir = path.join(dataDir, "s3");
  try {
    return await startFakeS3({ port: 4568, dir });
  } catch {
    return startFakeS3({ port: 0, dir });
  }
}

/** A random secret kept in the data folder, so demo sessions survive a restart. */
function demoSessionSecret(): string {
  const file = path.join(dataDir, "session-secret");
  if (!fs.existsSync(file)) fs.writeFileSync(file, crypto.randomBytes(32).toString("hex"), { mode: 0o600 });
  return fs.readFileSync(file, "utf8").trim();
}
