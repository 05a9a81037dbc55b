/**
 * Reads a request body with a size limit, counting the bytes as they arrive (a missing or false
 * Content-Length cannot get past the limit). Answers are thrown as JSON Responses: 413 beyond the
 * limit, 400 for text that is not JSON.
 */

export const ONE_MEGABYTE = 1024 * 1024;

function tooLarge(maxBytes: number, field: string): Response {
  const message = `The request body is too large: at most ${Math.round(maxBytes / 1024)} KB.`;
  return Response.json(
    { error: message, issues: [{ path: field, message: "is too large" }] },
    { status: 413 },
  );
}

/**
 * The body as text, or a thrown 413 Response once more than `maxBytes` arrive.
 * @param field what the body is called in the error (e.g. "(body)").
 */
export async function readLimitedText(request: Request, maxBytes: number, field = "(body)"): Promise<string> {
  const declared = Number(request.headers.get("Content-Length") ?? "");
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge(maxBytes, field);
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => {});
      throw tooLarge(maxBytes, field);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const c of chunks) {
    bytes.set(c, offset);
    offset += c.byteLength;
  }
  return new TextDecoder().decode(bytes);
}

/** The body parsed as JSON; a thrown 400 Response naming `(body)` when it is not JSON. */
export async function readJsonBody(request: Request, maxBytes: number): Promise<unknown> {
  const text = await readLimitedText(request, maxBytes);
  try {
    return JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (err) {
    const message = `is not valid JSON: ${(err as Error).message}`;
    throw Response.json(
      { error: `The request body ${message}.`, issues: [{ path: "(body)", message }] },
      { status: 400 },
    );
  }
}
