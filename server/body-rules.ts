/**
 * How large a request body may be and in which encodings, by route id (see server/routes.ts).
 * A route not listed takes DEFAULT_BODY_RULE: a form of at most 64 KB. Each listed limit sits a
 * little above the route's own limit, so for an honest request the route's own message answers
 * first; the server's limit is the backstop for bodies that are sent in chunks or lie about their
 * length. docs/decisions/0311-request-body-limits.md gives the reasons.
 */
export type BodyType = "urlencoded" | "multipart" | "json";

export type BodyRule = {
  /** The most the server reads of one body, bytes. */
  maxBytes: number;
  accepts: readonly BodyType[];
  /**
   * Multipart bodies go to the route as they arrive (still counted) instead of being read and
   * checked first: for uploads, whose route parses and refuses malformed parts itself.
   */
  streamMultipart?: boolean;
};

const KB = 1024;
const MB = 1024 * KB;

/** Every form of the app: a few fields, at most 64 KB. */
export const DEFAULT_BODY_RULE: BodyRule = { maxBytes: 64 * KB, accepts: ["urlencoded", "multipart"] };

export const BODY_RULES: Readonly<Record<string, BodyRule>> = {
  // The editor's save: the layout document as JSON, at most 5 MB (layout-editor.tsx), or as fields.
  "routes/layout-editor": { maxBytes: 5 * MB + 64 * KB, accepts: ["json", "urlencoded", "multipart"] },
  // Import: a pasted or uploaded layout file of at most 1 MB (MAX_LAYOUT_FILE_BYTES).
  "routes/layout-import": { maxBytes: MB + 128 * KB, accepts: ["urlencoded", "multipart"] },
  // Site photo upload: at most 10 MB (MAX_PHOTO_BYTES), parsed by the route as it arrives.
  "routes/layout-photo": { maxBytes: 10 * MB + 128 * KB, accepts: ["multipart"], streamMultipart: true },
  // Calibration: two lap files of at most 256 KB each and the fields (MAX_CALIBRATION_BODY_BYTES).
  "routes/layout-calibrate": { maxBytes: 576 * KB + 64 * KB, accepts: ["urlencoded", "multipart"] },
  // The analysis API: a layout document as JSON, at most 1 MB (api-analysis.ts).
  "routes/api-analysis": { maxBytes: MB + 64 * KB, accepts: ["json"] },
  // The editor's marshal plan: the draft document as JSON, at most 1 MB (marshal-plan-api.server.ts).
  "routes/api-marshal-plan": { maxBytes: MB + 64 * KB, accepts: ["json"] },
};

export function bodyRuleFor(routeId: string | undefined): BodyRule {
  return (routeId && BODY_RULES[routeId]) || DEFAULT_BODY_RULE;
}

/** "64 KB", "1.1 MB": a limit as people read it. */
export function formatBytes(bytes: number): string {
  if (bytes < MB) return `${Math.round(bytes / KB)} KB`;
  const mb = bytes / MB;
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
}
