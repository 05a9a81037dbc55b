/**
 * The analysis API's quick way to the version a caller reads (the rules of reading.server.ts):
 * one prepared single-row query, since a warm answer is otherwise only a memo lookup
 * (docs/decisions/0452-one-query-api-access.md).
 */
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { getDb, type Database } from "~/db/client.server";
import { publishedVersions } from "~/db/schema";
import type { Role } from "~/lib/roles";
import { parseVersionParam } from "./reading.server";

export type ApiReading =
  | { kind: "draft" }
  | {
      kind: "published" | "saved";
      number: number;
      publication: { versionNumber: number; raceDate: string | null; withdrawn: boolean } | null;
    };

const columns = {
  versionNumber: publishedVersions.versionNumber,
  raceDate: publishedVersions.raceDate,
  withdrawnAt: publishedVersions.withdrawnAt,
};

function buildQueries(db: Database) {
  return {
    /** The newest publication not withdrawn. */
    current: db
      .select(columns)
      .from(publishedVersions)
      .where(
        and(
          eq(publishedVersions.layoutId, sql.placeholder("layoutId")),
          isNull(publishedVersions.withdrawnAt),
        ),
      )
      .orderBy(desc(publishedVersions.versionNumber))
      .limit(1)
      .prepare(),
    /** A publication of one version number (a live one before a withdrawn one). */
    numbered: db
      .select(columns)
      .from(publishedVersions)
      .where(
        and(
          eq(publishedVersions.layoutId, sql.placeholder("layoutId")),
          eq(publishedVersions.versionNumber, sql.placeholder("number")),
        ),
      )
      .orderBy(sql`${publishedVersions.withdrawnAt} is not null`)
      .limit(1)
      .prepare(),
  };
}

let prepared: { db: Database; queries: ReturnType<typeof buildQueries> } | undefined;

async function queries() {
  const db = await getDb();
  if (!prepared || prepared.db !== db) prepared = { db, queries: buildQueries(db) };
  return prepared.queries;
}

const notFound = (message: string) => Response.json({ error: message }, { status: 404 });

/**
 * The version the caller reads: "draft" for a director's default, else the version's number and
 * its publication. Throws the JSON 404 or 400 of readingFor.
 */
export async function apiReading(layoutId: string, role: Role, query: URLSearchParams): Promise<ApiReading> {
  const asked = parseVersionParam(query.get("version"), true);
  if (role === "director" && (asked === null || asked === "draft")) return { kind: "draft" };
  if (asked === "draft") throw notFound("No such version of this layout.");
  const q = await queries();
  const [row] =
    asked === null
      ? await q.current.execute({ layoutId })
      : await q.numbered.execute({ layoutId, number: asked });
  if (!row && asked === null) throw notFound("This layout has no published version.");
  if (!row && role !== "director") throw notFound("No such version of this layout.");
  const publication = row
    ? { versionNumber: row.versionNumber, raceDate: row.raceDate, withdrawn: row.withdrawnAt !== null }
    : null;
  return { kind: publication ? "published" : "saved", number: (asked ?? row?.versionNumber)!, publication };
}
