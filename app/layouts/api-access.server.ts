/**
 * The layout check of the analysis API in one database round trip: the same rules and answers as
 * `requireLayoutAccess(request, id, "member", { api: true })` (401 signed out or unknown user, 404
 * for a missing layout, 403 for a non-member, 404 for a layout the role may not see), and the
 * club's track guidance from the same query. The API's warm answers are a memo lookup, so the
 * five separate queries of the general helper were most of their cost
 * (docs/decisions/0452-one-query-api-access.md); tests/integration/api-analysis.test.ts holds the
 * two checks to the same answers.
 */
import { and, eq, sql } from "drizzle-orm";
import { getSession } from "~/auth/session.server";
import { readGuidance, type ClubGuidance } from "~/clubs/guidance.server";
import { getDb, type Database } from "~/db/client.server";
import { type Role, canSeeLayout } from "~/lib/roles";
import { clubs, layouts, memberships, users } from "~/db/schema";

/** The layout's fields the API needs (the analysis reads the rest only when its memo misses). */
export type ApiLayout = Pick<typeof layouts.$inferSelect, "id" | "clubId" | "status" | "version">;

const deny = (status: number, error: string) => Response.json({ error }, { status });

/** The user, the layout with its club's guidance, and the user's role there: built once, reused. */
function buildAccessQuery(db: Database) {
  return db
    .select({
      userId: users.id,
      sessionVersion: users.sessionVersion,
      layout: {
        id: layouts.id,
        clubId: layouts.clubId,
        status: layouts.status,
        version: layouts.version,
      },
      role: memberships.role,
      guidanceSet: clubs.guidanceSet,
      guidanceOverrides: clubs.guidanceOverrides,
    })
    .from(users)
    .leftJoin(layouts, eq(layouts.id, sql.placeholder("layoutId")))
    .leftJoin(clubs, eq(clubs.id, layouts.clubId))
    .leftJoin(memberships, and(eq(memberships.clubId, layouts.clubId), eq(memberships.userId, users.id)))
    .where(eq(users.id, sql.placeholder("userId")))
    .prepare();
}

let prepared: { db: Database; query: ReturnType<typeof buildAccessQuery> } | undefined;

async function accessQuery() {
  const db = await getDb();
  // A new database handle (tests, scripts) needs the query prepared again.
  if (!prepared || prepared.db !== db) prepared = { db, query: buildAccessQuery(db) };
  return prepared.query;
}

/** The layout, the reader's role and the club's guidance; throws the JSON refusal otherwise. */
export async function apiLayoutAccess(
  request: Request,
  layoutId: string | undefined,
): Promise<{ userId: string; layout: ApiLayout; role: Role; guidance: ClubGuidance }> {
  const session = await getSession(request);
  const userId = session.get("userId");
  if (!userId) throw deny(401, "Sign in first.");
  const [row] = await (await accessQuery()).execute({ userId, layoutId: layoutId ?? "" });
  // As in getUser: a session from before the last password reset no longer counts.
  if (!row || row.sessionVersion !== (session.get("sessionVersion") ?? 0)) throw deny(401, "Sign in first.");
  if (
    !row.layout?.id ||
    row.layout.status === null ||
    row.layout.version === null ||
    row.guidanceSet === null ||
    row.guidanceOverrides === null
  )
    throw deny(404, "No such layout.");
  if (!row.role) throw deny(403, "You are not a member of this club.");
  if (!canSeeLayout(row.role, row.layout.status)) throw deny(404, "No such layout.");
  const guidance = readGuidance({ guidanceSet: row.guidanceSet, guidanceOverrides: row.guidanceOverrides });
  return { userId, layout: row.layout, role: row.role, guidance };
}
