import { afterAll, beforeAll } from "vitest";
import { startFakeSmtp, type FakeSmtp } from "~/mail/fake-smtp.server";
import { listOutbox, type OutboxMessage } from "~/mail/outbox.server";

/**
 * Starts the real fake SMTP server on a free port for this test file and points SMTP_URL at it.
 * Call after useTestDatabase() (which sets DATA_DIR, where the outbox lives).
 */
export function useFakeSmtp() {
  let server: FakeSmtp | undefined;
  beforeAll(async () => {
    server = await startFakeSmtp({ port: 0, host: "127.0.0.1" });
    process.env.SMTP_URL = `smtp://127.0.0.1:${server.port}`;
  });
  afterAll(async () => {
    await server?.close();
  });
  return {
    get port() {
      if (!server) throw new Error("useFakeSmtp: the server starts in beforeAll");
      return server.port;
    },
  };
}

/**
 * Waits for the newest message to `to` whose subject matches, received after `since` (a Date or
 * an ISO time; default: any time). Rejects after `timeoutMs` naming what it waited for.
 */
export async function waitForMail(
  to: string,
  subjectMatch: string | RegExp,
  opts: { since?: Date | string; timeoutMs?: number } = {},
): Promise<OutboxMessage> {
  const address = to.trim().toLowerCase();
  const since = opts.since ? new Date(opts.since).getTime() : -Infinity;
  const deadline = Date.now() + (opts.timeoutMs ?? 5000);
  const matches = (m: OutboxMessage) =>
    m.to.includes(address) &&
    (typeof subjectMatch === "string" ? m.subject.includes(subjectMatch) : subjectMatch.test(m.subject)) &&
    new Date(m.date).getTime() >= since;
  for (;;) {
    const found = (await listOutbox()).find(matches);
    if (found) return found;
    if (Date.now() > deadline) {
      throw new Error(
        `waitForMail: no message to ${address} with subject ${String(subjectMatch)} arrived in time`,
      );
    }
    await new Promise((r) => setTimeout(r, 25));
  }
}

/** Messages to `to` received so far (newest first). */
export async function mailsTo(to: string): Promise<OutboxMessage[]> {
  const address = to.trim().toLowerCase();
  return (await listOutbox()).filter((m) => m.to.includes(address));
}

/** The first http(s) link in a message's text; throws when there is none. */
export function extractLink(text: string): string {
  const match = text.match(/https?:\/\/[^\s<>"')]+/);
  if (!match) throw new Error(`extractLink: no link in:\n${text}`);
  return match[0];
}

/** The path and query of the first link (ready for getRequest / a browser on another port). */
export function extractPath(text: string): string {
  const url = new URL(extractLink(text));
  return url.pathname + url.search;
}
