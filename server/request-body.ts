/**
 * Reads a request's body under its route's rule (server/body-rules.ts) before the app sees it:
 * the bytes are counted as they arrive and reading stops at the limit, whatever Content-Length
 * says or whether the body comes in chunks. Forms are read whole (at most the limit) and checked,
 * so a malformed one is answered 400 here instead of failing inside an action; JSON and uploads
 * go on as a counted stream that the route parses itself.
 */
import type { IncomingMessage } from "node:http";
import getRawBody from "raw-body";
import { formatBytes, type BodyRule, type BodyType } from "./body-rules";

/** Why a body is refused, with the status to answer. */
export type Refusal = { status: 400 | 413 | 415; message: string };

export type PreparedBody = {
  body: Uint8Array<ArrayBuffer> | ReadableStream<Uint8Array> | null;
  /** Replaces the client's Content-Type (an empty form sent without one). */
  contentType?: string;
};

const MEDIA_TYPES: Record<string, BodyType> = {
  "application/x-www-form-urlencoded": "urlencoded",
  "multipart/form-data": "multipart",
  "application/json": "json",
};

const DESCRIBED: Record<BodyType, string> = {
  urlencoded: "a form (application/x-www-form-urlencoded)",
  multipart: "multipart/form-data",
  json: "JSON (application/json)",
};

/** The error a counted stream fails with once its body passes the limit. */
export class BodyTooLargeError extends Error {
  constructor(readonly maxBytes: number) {
    super(tooLargeMessage(maxBytes));
    this.name = "BodyTooLargeError";
  }
}

export function tooLargeMessage(maxBytes: number): string {
  return `The request body is too large: this address takes at most ${formatBytes(maxBytes)}.`;
}

export function isRefusal(value: PreparedBody | Refusal): value is Refusal {
  return "status" in value;
}

/** True when the request carries a body (a length above 0, or chunks). */
export function hasBody(req: IncomingMessage): boolean {
  return req.headers["transfer-encoding"] !== undefined || Number(req.headers["content-length"] ?? 0) > 0;
}

/**
 * The body to hand to the app, or why it is refused. `beforeRead` runs once the body is accepted
 * and is about to be read (the caller sends "100 Continue" to a client that waits for it);
 * `onTooLarge` runs when a counted stream passes the limit after the app has started reading it
 * (the caller answers 413 then).
 */
export async function prepareBody(
  req: IncomingMessage,
  rule: BodyRule,
  hooks: { beforeRead: () => void; onTooLarge: () => void },
): Promise<PreparedBody | Refusal> {
  const rawType = req.headers["content-type"];
  if (!hasBody(req)) {
    // A form with no fields may come without a type; the app reads it as an empty form.
    const empty = rawType === undefined && rule.accepts.includes("urlencoded");
    return { body: null, contentType: empty ? "application/x-www-form-urlencoded" : undefined };
  }
  const declared = Number(req.headers["content-length"] ?? 0);
  if (declared > rule.maxBytes) return { status: 413, message: tooLargeMessage(rule.maxBytes) };
  const encoding = req.headers["content-encoding"];
  if (encoding !== undefined && encoding.toLowerCase() !== "identity") {
    return { status: 415, message: "Compressed request bodies are not accepted: send it uncompressed." };
  }

  const media = (rawType ?? "").split(";")[0].trim().toLowerCase();
  const type = MEDIA_TYPES[media];
  if (!type || !rule.accepts.includes(type)) {
    const wanted = rule.accepts.map((t) => DESCRIBED[t]).join(" or ");
    const got = rawType ? `not ${media || "an empty type"}` : "but the request has no Content-Type";
    return { status: 415, message: `This address takes ${wanted}, ${got}.` };
  }
  if (type === "multipart" && !/;\s*boundary=/i.test(rawType ?? "")) {
    return { status: 400, message: "The multipart form has no boundary in its Content-Type." };
  }
  hooks.beforeRead();
  if (type === "json" || (type === "multipart" && rule.streamMultipart)) {
    return { body: countedStream(req, rule.maxBytes, hooks.onTooLarge) };
  }

  let bytes: Buffer;
  try {
    bytes = await getRawBody(req, { limit: rule.maxBytes, length: req.headers["content-length"] });
  } catch (error) {
    const type = (error as getRawBody.RawBodyError).type;
    if (type === "entity.too.large") return { status: 413, message: tooLargeMessage(rule.maxBytes) };
    if (type === "request.size.invalid")
      return { status: 400, message: "The body's length does not match its Content-Length." };
    if (type === "request.aborted") return { status: 400, message: "The request was cut off." };
    throw error;
  }
  const body = new Uint8Array(bytes.buffer as ArrayBuffer, bytes.byteOffset, bytes.byteLength);
  if (type === "multipart") {
    try {
      await new Response(body, { headers: { "Content-Type": rawType! } }).formData();
    } catch {
      return { status: 400, message: "The form could not be read: its multipart body is malformed." };
    }
  }
  return { body };
}

/**
 * The request body as a web stream that counts its bytes and fails with BodyTooLargeError past
 * `maxBytes`. Cancelling it only pauses the socket: an answer may still have to go out on it.
 */
function countedStream(
  req: IncomingMessage,
  maxBytes: number,
  onTooLarge: () => void,
): ReadableStream<Uint8Array> {
  let total = 0;
  let settled = false;
  return new ReadableStream<Uint8Array>(
    {
      start(controller) {
        req.on("data", (chunk: Buffer) => {
          if (settled) return;
          total += chunk.byteLength;
          if (total > maxBytes) {
            settled = true;
            req.pause();
            controller.error(new BodyTooLargeError(maxBytes));
            onTooLarge();
            return;
          }
          controller.enqueue(new Uint8Array(chunk.buffer, chunk.byteOffset, chunk.byteLength));
          if ((controller.desiredSize ?? 0) <= 0) req.pause();
        });
        req.once("end", () => {
          if (settled) return;
          settled = true;
          controller.close();
        });
        req.once("close", () => {
          if (settled) return;
          settled = true;
          controller.error(new Error("The client closed the connection before the body ended."));
        });
      },
      pull() {
        if (!settled) req.resume();
      },
      cancel() {
        settled = true;
        req.pause();
      },
    },
    { highWaterMark: 64 * 1024, size: (chunk) => chunk.byteLength },
  );
}
