/**
 * `npm run dev`: migrates the development database, adds the demo data (harmless when already
 * there), starts the local fake SMTP server on port 2525 (the default SMTP_URL), the fake S3 server
 * on port 4568 (files under DATA_DIR/s3; not when S3_BUCKET or FILE_STORE is set) and
 * `react-router dev` with hot reload. Extra arguments go to `react-router dev` (e.g. `-- --port 4000`).
 * Ctrl-C stops them all.
 */
import { spawn } from "node:child_process";
import path from "node:path";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { seedDemoData } from "~/db/demo-data.server";
import { startFakeSmtp } from "~/mail/fake-smtp.server";
import { startFakeS3 } from "~/storage/fake-s3.server";

const smtpPort = Number(new URL(process.env.SMTP_URL ?? "smtp://127.0.0.1:2525").port || 25);

await migrateDatabase();
await seedDemoData(await getDb());
closeDb();

const smtp = await startFakeSmtp({ port: smtpPort }).catch((error: Error) => {
  console.error(`Could not start the fake SMTP server on port ${smtpPort}: ${error.message}`);
  process.exit(1);
});
console.log(`Fake SMTP server on port ${smtp.port}; messages appear at /outbox.`);

const s3 =
  process.env.S3_BUCKET || process.env.FILE_STORE
    ? undefined
    : await startFakeS3({ port: 4568 }).catch(async (error: Error) => {
        console.error(`Could not start the fake S3 server on port 4568: ${error.message}`);
        await smtp.close();
        process.exit(1);
      });
if (s3) console.log(`Fake S3 server on port ${s3.port}; files in ${s3.dir}.`);

const child = spawn(path.resolve("node_modules/.bin/react-router"), ["dev", ...process.argv.slice(2)], {
  stdio: "inherit",
  env: { ...process.env, ...s3?.env },
});

let stopping = false;
async function stop(code: number) {
  if (stopping) return;
  stopping = true;
  if (child.exitCode === null) child.kill("SIGTERM");
  await Promise.all([smtp.close(), s3?.close()]);
  process.exit(code);
}
process.on("SIGINT", () => void stop(0));
process.on("SIGTERM", () => void stop(0));
child.once("exit", (code) => void stop(code ?? 0));
