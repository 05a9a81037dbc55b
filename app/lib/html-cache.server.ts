/**
 * Rendered reader pages kept by what they were rendered from (docs/decisions/0459-reader-page-speed.md).
 * A route opts in with `export const handle = { htmlCache: true }` when its page is a pure function
 * of its data: the loaders' data, the address and the status (no clock, no random numbers, no
 * streamed promises). The loaders still run on every request (they check who may see the page and
 * give its current data); when their data equal an earlier request's, the HTML made then is sent
 * again instead of rendering it anew.
 *
 * Every answer keeps its own Content-Security-Policy nonce: the page is rendered once with a
 * placeholder nonce and kept in pieces around it; each answer puts its own nonce between them.
 * The gzip form is made once too: each piece is compressed on its own and ends on a full flush (so
 * nothing refers across a nonce), the nonce goes between as a stored block, and only the trailer's
 * CRC-32 is computed per answer. Bounded by bytes with lru-cache, least recently used first out.
 */
import { createHash } from "node:crypto";
import { constants, crc32, deflateRawSync } from "node:zlib";
import { LRUCache } from "lru-cache";

/** Bytes of HTML (plain and compressed) kept at most. */
export const HTML_CACHE_MAX_BYTES = 32 * 1024 * 1024;

/**
 * What the page is rendered with instead of the response's nonce: base64 letters only, as long
 * as a real nonce (16 random bytes in base64), never written by anything else.
 */
export const NONCE_SLOT = "LoftlineNonceSlotQ7xK2w=";

/** A rendered page in pieces around its nonces, plain and deflated. */
export interface CachedPage {
  readonly pieces: readonly Buffer[];
  readonly deflated: readonly Buffer[];
  readonly bytes: number;
}

const pages = new LRUCache<string, CachedPage>({
  maxSize: HTML_CACHE_MAX_BYTES,
  maxEntrySize: HTML_CACHE_MAX_BYTES,
  sizeCalculation: (page) => Math.max(1, page.bytes),
});

const sha256 = (text: string) => createHash("sha256").update(text).digest("base64url");

/** Values never changed once made (the memo's page data), with the hash of their JSON. */
const unchanging = new WeakMap<object, string | null>();

/**
 * Marks a value that is never changed after this call (a memo entry's page data): page keys then
 * hash its JSON once, not on every request.
 */
export function markUnchanging<T extends object>(value: T): T {
  if (!unchanging.has(value)) unchanging.set(value, null);
  return value;
}

/** JSON.stringify's replacer: an unchanging value is written as the hash of its JSON. */
function digestUnchanging(_key: string, value: unknown): unknown {
  if (value === null || typeof value !== "object" || !unchanging.has(value)) return value;
  let digest = unchanging.get(value);
  if (!digest) {
    digest = `#${sha256(JSON.stringify(value))}`;
    unchanging.set(value, digest);
  }
  return digest;
}

/** The key of a page: a SHA-256 (base64url) of everything its HTML is made from. */
export function pageKey(parts: { build: string; url: string; status: number; loaderData: unknown }): string {
  return sha256(JSON.stringify(parts, digestUnchanging));
}

/** The page rendered earlier from the same data, if still kept. */
export function recallPage(key: string): CachedPage | undefined {
  return pages.get(key);
}

/** Splits `html` at every NONCE_SLOT. */
function piecesOf(html: Buffer): Buffer[] {
  const slot = Buffer.from(NONCE_SLOT);
  const pieces: Buffer[] = [];
  let from = 0;
  for (let at = html.indexOf(slot); at !== -1; at = html.indexOf(slot, from)) {
    pieces.push(html.subarray(from, at));
    from = at + slot.length;
  }
  pieces.push(html.subarray(from));
  return pieces;
}

/** Keeps a page rendered with NONCE_SLOT as its nonce under its key. */
export function keepPage(key: string, html: Buffer): CachedPage {
  const pieces = piecesOf(html).map((p) => Buffer.from(p));
  // Each piece on its own, ending byte-aligned on a full flush: no back-reference crosses a nonce.
  const deflated = pieces.map((p) => deflateRawSync(p, { finishFlush: constants.Z_FULL_FLUSH }));
  const bytes = [...pieces, ...deflated].reduce((n, b) => n + b.byteLength, 0);
  const page = { pieces, deflated, bytes };
  pages.set(key, page);
  return page;
}

/** The page's HTML with this response's nonce. */
export function pageHtml(page: CachedPage, nonce: string): Buffer {
  const n = Buffer.from(nonce);
  return Buffer.concat(page.pieces.flatMap((p, i) => (i === 0 ? [p] : [n, p])));
}

const GZIP_HEADER = Buffer.from([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 0xff]);
/** The last block: empty, stored, final. */
const FINAL_BLOCK = Buffer.from([0x01, 0x00, 0x00, 0xff, 0xff]);

/** A stored (uncompressed) deflate block holding `data`, starting on a byte boundary. */
function storedBlock(data: Buffer): Buffer {
  const head = Buffer.alloc(5);
  head.writeUInt8(0, 0); // not final, stored; the rest of the byte is padding
  head.writeUInt16LE(data.byteLength, 1);
  head.writeUInt16LE(~data.byteLength & 0xffff, 3);
  return Buffer.concat([head, data]);
}

/** The page's gzip form with this response's nonce, from the pieces deflated once. */
export function pageGzip(page: CachedPage, nonce: string): Buffer {
  const n = Buffer.from(nonce);
  const block = storedBlock(n);
  const trailer = Buffer.alloc(8);
  let crc = 0;
  let size = 0;
  page.pieces.forEach((p, i) => {
    if (i > 0) {
      crc = crc32(n, crc);
      size += n.byteLength;
    }
    crc = crc32(p, crc);
    size += p.byteLength;
  });
  trailer.writeUInt32LE(crc >>> 0, 0);
  trailer.writeUInt32LE(size >>> 0, 4);
  const body = page.deflated.flatMap((d, i) => (i === 0 ? [d] : [block, d]));
  return Buffer.concat([GZIP_HEADER, ...body, FINAL_BLOCK, trailer]);
}

/** Pages and bytes kept (tests). */
export function htmlCacheStats() {
  return { pages: pages.size, bytes: pages.calculatedSize };
}

/**
 * The answer for a kept page with this response's nonce: gzip-compressed when the request accepts
 * gzip (made from the pieces compressed once, so no compression runs), else plain.
 */
export function pageResponse(
  request: Request,
  page: CachedPage,
  nonce: string,
  status: number,
  headers: Headers,
): Response {
  headers.set("Content-Type", "text/html; charset=utf-8");
  headers.append("Vary", "Accept-Encoding");
  const gzip = /\bgzip\b/.test(request.headers.get("Accept-Encoding") ?? "");
  const body = gzip ? pageGzip(page, nonce) : pageHtml(page, nonce);
  if (gzip) headers.set("Content-Encoding", "gzip");
  headers.set("Content-Length", String(body.byteLength));
  return new Response(body as Uint8Array<ArrayBuffer>, { status, headers });
}
