/**
 * Which version of a layout a reader sees (docs/decisions/0800-publishing-model.md): marshals and
 * drivers the race-day version (the newest published one not withdrawn) unless the address names
 * an earlier published one (`?version=6`); directors the working draft unless the address names a
 * saved version. A draft never reaches a marshal or a driver: asking for one is 404.
 */
import type { LayoutDocument } from "~/analysis";
import type { layouts } from "~/db/schema";
import type { Role } from "~/lib/roles";
import { loadLayoutDocument, loadVersionDocument } from "./documents.server";
import { currentPublication, listPublications, type Publication } from "./publications.server";

type LayoutRow = typeof layouts.$inferSelect;

export type Reading = {
  /** The working draft (directors only), a published version, or another saved version (directors). */
  kind: "draft" | "published" | "saved";
  /** The stored version's number; null for a draft never drawn (the starter loop). */
  number: number | null;
  document: LayoutDocument;
  /** The publication of the version read (withdrawn ones included), or null. */
  publication: Publication | null;
  /** The race-day version: the newest publication not withdrawn, or null. */
  current: Publication | null;
  /** Every publication, newest first (withdrawn ones stay readable at their address). */
  publications: Publication[];
  /** The query parameter that names this version in links: {} for the reader's default. */
  query: Record<string, string>;
};

const refuse = (status: number, message: string, api: boolean) =>
  api
    ? Response.json({ error: message }, { status })
    : new Response(message, { status, statusText: message });

/** `version` of the query: a saved version's number, "draft", or absent; anything else is 400. */
export function parseVersionParam(value: string | null, api = false): number | "draft" | null {
  if (value === null || value === "") return null;
  if (value === "draft") return "draft";
  if (/^\d{1,9}$/.test(value)) return Number(value);
  throw refuse(
    400,
    `version: must be a saved version's number or "draft" (got "${value.slice(0, 20)}").`,
    api,
  );
}

/**
 * Which stored version a request reads, without reading any document (the API's quick path):
 * "draft" for a director's default, else the version's number and its publication.
 * @throws the 404 or 400 Response of readingFor.
 */
async function readingNumber(
  layoutId: string,
  role: Role,
  query: URLSearchParams,
  opts: { api?: boolean } = {},
): Promise<
  | { kind: "draft"; publications: Publication[]; current: Publication | null }
  | {
      kind: "published" | "saved";
      number: number;
      publication: Publication | null;
      publications: Publication[];
      current: Publication | null;
      asked: boolean;
    }
> {
  const api = opts.api ?? false;
  const asked = parseVersionParam(query.get("version"), api);
  const publications = await listPublications(layoutId);
  const current = currentPublication(publications);
  if (role === "director" && (asked === null || asked === "draft"))
    return { kind: "draft", publications, current };
  if (asked === "draft") throw refuse(404, "No such version of this layout.", api);
  const number = asked ?? current?.versionNumber;
  if (number === undefined) throw refuse(404, "This layout has no published version.", api);
  const publication = publications.find((p) => p.versionNumber === number) ?? null;
  if (!publication && role !== "director") throw refuse(404, "No such version of this layout.", api);
  return {
    kind: publication ? "published" : "saved",
    number,
    publication,
    publications,
    current,
    asked: asked !== null,
  };
}

/**
 * The version the request reads, with its document and the layout's publications.
 * @throws a 404 Response for a draft or unpublished version asked by a marshal or driver, a
 *   version that does not exist, or a layout with no published version; 400 for a bad `version`.
 */
export async function readingFor(
  layout: LayoutRow,
  role: Role,
  query: URLSearchParams,
  opts: { api?: boolean } = {},
): Promise<Reading> {
  const api = opts.api ?? false;
  const which = await readingNumber(layout.id, role, query, opts);
  const { publications, current } = which;
  if (which.kind === "draft") {
    const { document, versionNumber } = await loadLayoutDocument(layout);
    return {
      kind: "draft",
      number: versionNumber,
      document,
      publication: null,
      publications,
      current,
      query: {},
    };
  }
  const document = await loadVersionDocument(layout.id, which.number);
  if (!document) throw refuse(404, "No such version of this layout.", api);
  return {
    kind: which.kind,
    number: which.number,
    document,
    publication: which.publication,
    publications,
    current,
    query: which.asked ? { version: String(which.number) } : {},
  };
}

/** What the analysis needs to memoise a stored version by its number (undefined for the draft). */
export function savedSource(
  reading: Pick<Reading, "kind" | "number" | "document">,
): { number: number; load: () => Promise<LayoutDocument> } | undefined {
  if (reading.kind === "draft" || reading.number === null) return undefined;
  const document = reading.document;
  return { number: reading.number, load: async () => document };
}

/** What the pages show about the version read (no document). */
export function readingView(reading: Reading) {
  const { kind, number, publication, current, publications, query } = reading;
  return { kind, number, publication, current, publications, query };
}
export type ReadingView = ReturnType<typeof readingView>;
