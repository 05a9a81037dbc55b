/**
 * What the editor's save action accepts: a JSON body (or form fields, with the document as JSON
 * text) with an intent, the layout document and, for a save, the version it started from.
 * Usable on both sides; every problem names its field.
 */
import { z } from "zod";
import { parseLayoutDocument, type LayoutDocument, type LayoutIssue } from "~/analysis";

export const SAVE_INTENTS = ["save", "save-copy"] as const;
export type SaveIntent = (typeof SAVE_INTENTS)[number];

const envelope = z.object({
  intent: z.enum(SAVE_INTENTS, { error: 'must be "save" or "save-copy"' }),
  baseVersion: z.coerce
    .number({ error: "must be a whole number" })
    .int({ error: "must be a whole number" })
    .min(1, { error: "must be at least 1" })
    .optional(),
  note: z.string({ error: "must be text" }).max(200, { error: "must be at most 200 characters" }).optional(),
});

export type SaveRequest = {
  intent: SaveIntent;
  document: LayoutDocument;
  baseVersion?: number;
  note?: string;
};
export type SaveRequestResult =
  { ok: true; request: SaveRequest } | { ok: false; error: string; issues: LayoutIssue[] };

/**
 * Checks a save request body (already read as JSON, or the fields of a form).
 * @returns the request, or the issues; each issue's path names the field, e.g.
 * "document.sections[2].radius" or "baseVersion".
 */
export function parseSaveRequest(body: unknown): SaveRequestResult {
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    return fail([{ path: "(body)", message: "must be a JSON object with intent, document and baseVersion" }]);
  }
  const raw = body as Record<string, unknown>;
  const head = envelope.safeParse(raw);
  const issues: LayoutIssue[] = head.success
    ? []
    : head.error.issues.map((i) => ({ path: i.path.join(".") || "(body)", message: i.message }));
  if (head.success && head.data.intent === "save" && head.data.baseVersion === undefined) {
    issues.push({
      path: "baseVersion",
      message: "is required: the version of the layout the changes started from",
    });
  }
  let document: LayoutDocument | undefined;
  if (raw.document === undefined || raw.document === null || raw.document === "") {
    issues.push({ path: "document", message: "is required" });
  } else {
    const parsed = parseLayoutDocument(raw.document);
    if (parsed.ok) document = parsed.document;
    else
      issues.push(
        ...parsed.issues.map((i) => ({
          path: i.path === "(document)" ? "document" : `document.${i.path}`,
          message: i.message,
        })),
      );
  }
  if (issues.length || !head.success || !document) return fail(issues);
  return {
    ok: true,
    request: { intent: head.data.intent, document, baseVersion: head.data.baseVersion, note: head.data.note },
  };
}

function fail(issues: LayoutIssue[]): SaveRequestResult {
  const first = issues[0];
  const error = first
    ? `Not saved: ${first.path} ${first.message}${issues.length > 1 ? ` (and ${issues.length - 1} more)` : ""}.`
    : "Not saved.";
  return { ok: false, error, issues };
}
