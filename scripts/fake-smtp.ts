/**
 * Runs the local fake SMTP server on its own: every message it receives is kept in
 * ${DATA_DIR}/outbox and shown on the app's /outbox page in development.
 *
 *   FAKE_SMTP_PORT=2525 FAKE_SMTP_HOST=127.0.0.1 tsx scripts/fake-smtp.ts
 */
import { startFakeSmtp } from "../app/mail/fake-smtp.server";

function fail(message: string): never {
  process.stderr.write(`fake-smtp: ${message}\n`);
  process.exit(2);
}

const rawPort = process.env.FAKE_SMTP_PORT ?? "2525";
if (!/^\d+$/.test(rawPort) || Number(rawPort) < 1 || Number(rawPort) > 65535) {
  fail(`FAKE_SMTP_PORT must be a whole number from 1 to 65535 (got "${rawPort}").`);
}
const host = process.env.FAKE_SMTP_HOST ?? "127.0.0.1";

try {
  const smtp = await startFakeSmtp({ port: Number(rawPort), host });
  process.stdout.write(
    `fake-smtp: listening on smtp://${host}:${smtp.port}, keeping messages in ${smtp.dir}\n`,
  );
  const stop = () => {
    void smtp.close().then(() => process.exit(0));
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
} catch (err) {
  const e = err as NodeJS.ErrnoException;
  if (e.code === "EADDRINUSE") fail(`port ${rawPort} on ${host} is already in use (set FAKE_SMTP_PORT).`);
  fail(e.message);
}
