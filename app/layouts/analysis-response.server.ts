/**
 * JSON answers of the analysis API: the body text made once per memo entry, the cache header,
 * 400 answers that name the field, 422 over the analysis budget, 429 and 503 when busy.
 */
import type { CachedBody } from "~/layouts/analysis-memo.server";
import type { LayoutIssue } from "~/analysis";
import { AnalysisBudgetError, AnalysisBusyError } from "~/analysis-pool/errors";
import { AnalysisInputError } from "./analysis.server";

/** What an answer may be narrowed to: `only=overlay` is what the editor and the plan draw. */
export const ONLY_PARTS = ["overlay"] as const;
export type OnlyPart = (typeof ONLY_PARTS)[number];

/**
 * Checks `only` (a query parameter or a JSON field named `field`); undefined when absent.
 * @throws AnalysisInputError naming the field for anything else.
 */
export function parseOnly(value: unknown, field: string): OnlyPart | undefined {
  if (value === undefined || value === null || value === "") return undefined;
  if (typeof value === "string" && (ONLY_PARTS as readonly string[]).includes(value))
    return value as OnlyPart;
  throw new AnalysisInputError([{ path: field, message: `must be "overlay" or left out` }]);
}

/** A 400 answer listing every issue, each naming its field. */
export function badRequest(issues: LayoutIssue[], error?: string): Response {
  const text =
    error ??
    `Check ${issues.length === 1 ? "this field" : "these fields"}: ${issues.map((i) => `${i.path} ${i.message}`).join("; ")}.`;
  return Response.json({ error: text, issues }, { status: 400 });
}

/**
 * Turns a refusal of the analysis into a 400 naming the field: the checks of this module, and the
 * engine's RangeErrors, whose messages start with the field ("skill: must be ...").
 * @param prefix put before an engine field that belongs to the document ("document.").
 */
export function analysisRefusal(error: unknown, prefix = ""): Response {
  if (error instanceof AnalysisInputError) return badRequest(error.issues);
  if (error instanceof AnalysisBudgetError) {
    const issues = error.issues.map((i) => ({
      path: i.path === "(document)" ? prefix.replace(/\.$/, "") || i.path : prefix + i.path,
      message: i.message,
    }));
    const text = `The analysis is over its limit: ${issues.map((i) => `${i.path} ${i.message}`).join("; ")}.`;
    return Response.json({ error: text, limit: error.limit, issues }, { status: 422 });
  }
  if (error instanceof AnalysisBusyError)
    return Response.json(
      { error: error.message },
      {
        status: error.scope === "server" ? 503 : 429,
        headers: { "Retry-After": String(error.retryAfterS) },
      },
    );
  if (error instanceof RangeError) {
    const match = /^([A-Za-z][\w.[\]]*): (.+)$/.exec(error.message);
    const issue = match
      ? {
          path: ["classId", "skill", "class"].includes(match[1]) ? match[1] : prefix + match[1],
          message: match[2],
        }
      : {
          path: prefix ? prefix.replace(/\.$/, "") : "(document)",
          message: `cannot be analysed: ${error.message}`,
        };
    return badRequest([issue]);
  }
  throw error;
}

/**
 * A JSON body already made, gzip-compressed when the client accepts it, with the memo's hit or
 * miss in X-Analysis-Cache.
 */
export async function jsonText(
  request: Request,
  body: CachedBody,
  hit: boolean,
  extra: Record<string, string> = {},
): Promise<Response> {
  const gzip = /\bgzip\b/.test(request.headers.get("Accept-Encoding") ?? "");
  const bytes = gzip ? await body.gzip() : body.bytes;
  return new Response(bytes as Uint8Array<ArrayBuffer>, {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Length": String(bytes.byteLength),
      ...(gzip ? { "Content-Encoding": "gzip" } : {}),
      Vary: "Accept-Encoding",
      "Cache-Control": "private, no-cache",
      "X-Analysis-Cache": hit ? "hit" : "miss",
      ...extra,
    },
  });
}
