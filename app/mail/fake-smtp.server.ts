/**
 * A real SMTP listener (smtp-server) for development, the demo and the tests. It accepts every
 * message, parses it with mailparser and keeps it in the outbox folder. Never for production:
 * it accepts any sender, any recipient and any credentials.
 */
import type { AddressInfo } from "node:net";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";
import { newMessageId, outboxDir, saveOutboxMessage } from "./outbox.server";

export type FakeSmtp = {
  /** The port it listens on (the real one when 0 was asked for). */
  port: number;
  host: string;
  /** The folder the messages are written to. */
  dir: string;
  close: () => Promise<void>;
};

/** Largest message accepted, bytes. */
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * Starts the listener. `port: 0` picks a free port (tests). Messages go to `dir`, by default
 * `${DATA_DIR}/outbox` as it is when the server starts.
 */
export async function startFakeSmtp(
  opts: { port?: number; host?: string; dir?: string } = {},
): Promise<FakeSmtp> {
  const host = opts.host ?? "127.0.0.1";
  const dir = opts.dir ?? outboxDir();
  const server = new SMTPServer({
    // Plain SMTP on a loopback port: no STARTTLS (a self-signed certificate would fail
    // nodemailer's check) and any or no credentials accepted.
    disabledCommands: ["STARTTLS"],
    hideSTARTTLS: true,
    authOptional: true,
    onAuth(_auth, _session, callback) {
      callback(null, { user: "outbox" });
    },
    size: MAX_MESSAGE_BYTES,
    logger: false,
    closeTimeout: 1000,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          if (stream.sizeExceeded) throw Object.assign(new Error("Message too large"), { responseCode: 552 });
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
          await saveOutboxMessage(
            {
              id: newMessageId(),
              to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
              from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ""),
              subject: parsed.subject ?? "",
              text: parsed.text ?? "",
              html: typeof parsed.html === "string" ? parsed.html : null,
              date: new Date().toISOString(),
            },
            dir,
          );
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port ?? 2525, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  server.on("error", (err) => console.error("[fake-smtp]", err.message));
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    host,
    dir,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => (v.address ?? "").toLowerCase())).filter(Boolean);
}
