/**
 * A plain HTTP client for the reliability tests (node:http, so that bodies can be sent in chunks,
 * declare a false length, or run on after the server has answered), and the app's routes as
 * app/routes.ts lists them, with their parameters filled from the demo data.
 */
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import { createClient } from "@libsql/client";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { inject } from "vitest";
import routes from "~/routes";

export type Answer = { status: number; headers: http.IncomingHttpHeaders; text: string };

export type SendOptions = {
  method?: string;
  headers?: Record<string, string>;
  /** The whole body, sent with its Content-Length. */
  body?: string | Buffer;
  /** A body of this many bytes (of `fill`), sent in 64 KB chunks without a Content-Length. */
  chunkedBytes?: number;
  fill?: number;
  /** The first bytes of a streamed body (e.g. a multipart part's headers). */
  prefix?: string;
  /** The local address to connect from (any 127.x.y.z): a client of its own to the server. */
  from?: string;
};

/** The server's port, from the harness. */
export function serverPort(): number {
  return Number(new URL(inject("baseUrl")).port);
}

/**
 * Sends one request and resolves with the answer. When the server answers before the body is
 * sent (as it should for a body over the limit), the rest is not sent and the answer counts.
 */
export function send(pathname: string, opts: SendOptions = {}): Promise<Answer> {
  return new Promise((resolve, reject) => {
    let answered = false;
    const headers: Record<string, string> = { Host: `localhost:${serverPort()}`, ...opts.headers };
    if (opts.chunkedBytes === undefined && opts.body !== undefined && !hasHeader(headers, "content-length"))
      headers["Content-Length"] = String(Buffer.byteLength(opts.body));
    const req = http.request(
      {
        host: "127.0.0.1",
        port: serverPort(),
        path: pathname,
        method: opts.method ?? "POST",
        headers,
        localAddress: opts.from,
        agent: false,
      },
      (res) => {
        answered = true;
        const parts: Buffer[] = [];
        res.on("data", (c: Buffer) => parts.push(c));
        res.on("end", () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            text: Buffer.concat(parts).toString(),
          }),
        );
        res.on("error", reject);
      },
    );
    req.on("error", (error) => {
      // Writing on after the answer came may fail once the server hangs up: that is expected.
      if (!answered) reject(error);
    });
    if (opts.chunkedBytes === undefined) {
      req.end(opts.body);
      return;
    }
    const chunk = Buffer.alloc(64 * 1024, opts.fill ?? 0x61);
    let sent = 0;
    if (opts.prefix) req.write(opts.prefix);
    // One chunk a turn of the event loop, so an answer that arrives mid-body is read at once: a
    // client that only writes can meet the server's hang-up (EPIPE) before it reads the answer.
    const pump = () => {
      if (answered || req.destroyed) return;
      if (sent >= opts.chunkedBytes!) return void req.end();
      const piece = chunk.subarray(0, Math.min(chunk.length, opts.chunkedBytes! - sent));
      sent += piece.length;
      if (req.write(piece)) setImmediate(pump);
      else req.once("drain", pump);
    };
    pump();
  });
}

function hasHeader(headers: Record<string, string>, name: string): boolean {
  return Object.keys(headers).some((k) => k.toLowerCase() === name);
}

/** Signs in through the server; returns the session cookie ("name=value"). */
export async function signIn(email: string, password: string, from?: string): Promise<string> {
  const answer = await send("/sign-in", {
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ email, password }).toString(),
    from,
  });
  const cookie = [answer.headers["set-cookie"] ?? []].flat()[0];
  if (answer.status !== 302 || !cookie) throw new Error(`sign-in failed: ${answer.status} ${answer.text}`);
  return cookie.split(";")[0];
}

/** Ids from the demo data: the demo club and its first layout. */
export async function demoIds(): Promise<{ clubId: string; layoutId: string }> {
  const db = createClient({ url: `file:${path.join(inject("dataDir"), "loftline.db")}` });
  try {
    const { rows } = await db.execute("SELECT id, club_id FROM layouts ORDER BY created_at LIMIT 1");
    return { clubId: String(rows[0].club_id), layoutId: String(rows[0].id) };
  } finally {
    db.close();
  }
}

export type AppRoute = { id: string; path: string };

/** Every route of app/routes.ts with its full path pattern ("/layouts/:layoutId/edit"). */
export function appRoutes(): AppRoute[] {
  const out: AppRoute[] = [];
  const walk = (entries: RouteConfigEntry[], base: string) => {
    for (const entry of entries) {
      const full = entry.path ? `${base.replace(/\/$/, "")}/${entry.path}` : base;
      out.push({ id: entry.file.replace(/\.[jt]sx?$/, ""), path: full || "/" });
      if (entry.children) walk(entry.children, full);
    }
  };
  walk(routes as RouteConfigEntry[], "");
  return out;
}

/** A path pattern with its parameters filled in. */
export function fillPath(pattern: string, ids: Record<string, string>): string {
  return pattern.replace(/:(\w+)/g, (_, name: string) => {
    if (name === "token") return "x".repeat(43);
    if (name === "fileId") return "00000000-0000-4000-8000-000000000000";
    return ids[name] ?? "unknown";
  });
}

/** Photos stored so far: objects in the fake S3 server's folder (s3rver's "<key>._S3rver_object"). */
export function storedPhotos(): number {
  const dir = path.join(inject("dataDir"), "s3");
  if (!fs.existsSync(dir)) return 0;
  return fs
    .readdirSync(dir, { recursive: true })
    .filter((f) => /\.(png|jpg)\._S3rver_object$/.test(String(f))).length;
}
