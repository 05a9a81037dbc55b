/**
 * The server's own refusals (403, 400, 413, 415), in the form the asker reads: JSON for the API
 * and other resource routes, plain text for the page's script (the framework shows it on the
 * error page), a small HTML page for a form sent without script.
 */
import type { IncomingMessage, ServerResponse } from "node:http";
import { hasBody } from "./request-body";

export type AnswerForm = "json" | "text" | "html";

const TITLES: Record<number, string> = {
  400: "That request could not be read",
  403: "Refused",
  413: "Too large",
  415: "Wrong kind of content",
};

export function refuse(
  req: IncomingMessage,
  res: ServerResponse,
  form: AnswerForm,
  status: number,
  message: string,
): void {
  if (res.headersSent) return;
  let body: string;
  if (form === "json") {
    res.setHeader("Content-Type", "application/json; charset=utf-8");
    body = JSON.stringify(
      status === 403 ? { error: message } : { error: message, issues: [{ path: "(body)", message }] },
    );
  } else if (form === "text") {
    res.setHeader("Content-Type", "text/plain; charset=utf-8");
    body = message;
  } else {
    res.setHeader("Content-Type", "text/html; charset=utf-8");
    body = page(TITLES[status] ?? "Refused", message);
  }
  res.statusCode = status;
  res.setHeader("Cache-Control", "no-store, no-transform");
  sendWhole(req, res, Buffer.from(body));
}

/**
 * Sends a whole answer (status and headers already set). When the request's body is still
 * arriving, the answer goes out now and the connection stays open while the rest is read and
 * dropped (never kept), then closes: closing at once would make the client's system reset the
 * connection while it still sends, which can lose the answer on its way back.
 */
export function sendWhole(req: IncomingMessage, res: ServerResponse, body: Uint8Array): void {
  res.setHeader("Content-Length", body.byteLength);
  if (!hasBody(req) || req.complete) {
    res.end(body);
    return;
  }
  res.setHeader("Connection", "close");
  res.write(body);
  (res as ServerResponse & { flush?: () => void }).flush?.(); // past compression's buffer
  void drainRest(req).then(() => res.end());
}

/**
 * How long, ms, and how much, bytes, of an unwanted body is read and dropped before hanging up.
 * The time is what counts: hanging up with unread bytes makes the system reset the connection,
 * and the client's system then throws away an answer it has not read yet. On loopback 16 MB went by
 * in some 10 ms, too short for a busy client to read the 413 first; 2 s of dropping (at most 1 GB)
 * gives every client time to read it. Dropped bytes are never kept.
 */
const LINGER_MS = 2000;
const LINGER_BYTES = 1024 * 1024 * 1024;

/**
 * Reads and drops what is left of a request's body. Resolves true once it has ended, or false
 * when it goes on past LINGER_MS or LINGER_BYTES (the connection must then close after the answer).
 */
function drainRest(req: IncomingMessage): Promise<boolean> {
  if (!hasBody(req) || req.complete) return Promise.resolve(true);
  return new Promise((resolve) => {
    let dropped = 0;
    const done = (complete: boolean) => {
      clearTimeout(timer);
      req.removeListener("data", onData);
      if (!complete) req.pause();
      resolve(complete);
    };
    const onData = (chunk: Buffer) => {
      dropped += chunk.byteLength;
      if (dropped > LINGER_BYTES) done(false);
    };
    const timer = setTimeout(() => done(false), LINGER_MS);
    req.removeAllListeners("data"); // whoever read it before (a counted stream) is done with it
    req.on("data", onData);
    req.once("end", () => done(true));
    req.once("close", () => done(req.complete));
    req.resume();
  });
}

function page(title: string, message: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · Loftline</title></head>
<body><main><h1>${escapeHtml(title)}</h1><p>${escapeHtml(message)}</p>
<p><a href="/">Back to the start page</a></p></main></body></html>
`;
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
