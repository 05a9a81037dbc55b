import { and, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { readGuidance, type ClubGuidance } from "~/clubs/guidance.server";
import { redirect } from "react-router";
import { getDb, type Database } from "~/db/client.server";
import { type Role, canSeeLayout, roleAllows } from "~/lib/roles";
import { clubs, layouts, memberships, users } from "~/db/schema";
import { getSession } from "./session.server";

export type SessionUser = { id: string; email: string; name: string };

/**
 * Users already read for a GET request: the root, the frame and the page each ask for the same
 * request's user, which is read once (no action can change it within a GET).
 */
const usersOfRequests = new WeakMap<Request, Promise<SessionUser | null>>();

/** The signed-in user, or null. */
export function getUser(request: Request): Promise<SessionUser | null> {
  if (request.method !== "GET") return readUser(request);
  let user = usersOfRequests.get(request);
  if (!user) {
    user = readUser(request);
    usersOfRequests.set(request, user);
  }
  return user;
}

async function readUser(request: Request): Promise<SessionUser | null> {
  const session = await getSession(request);
  const userId = session.get("userId");
  if (!userId) return null;
  const db = await getDb();
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name, sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(users.id, userId));
  // A session from before the last password reset no longer counts (the reset signs out every
  // other browser). Sessions without a version began before any reset.
  if (!user || user.sessionVersion !== (session.get("sessionVersion") ?? 0)) return null;
  return { id: user.id, email: user.email, name: user.name };
}

/**
 * The signed-in user; otherwise pages redirect to sign-in and API routes answer 401.
 */
export async function requireUser(request: Request, opts: { api?: boolean } = {}): Promise<SessionUser> {
  const user = await getUser(request);
  if (user) return user;
  if (opts.api) throw Response.json({ error: "Sign in first." }, { status: 401 });
  const url = new URL(request.url);
  throw redirect(`/sign-in?redirectTo=${encodeURIComponent(url.pathname + url.search)}`);
}

export type ClubAccess = { user: SessionUser; club: { id: string; name: string }; role: Role };

/**
 * Requires membership of the club (404 when the club does not exist, 403 when the user is not a
 * member), and with `need = "director"` the director role (403 otherwise).
 */
export async function requireClubRole(
  request: Request,
  clubId: string | undefined,
  need: "member" | "director" = "member",
  opts: { api?: boolean } = {},
): Promise<ClubAccess> {
  const user = await requireUser(request, opts);
  const db = await getDb();
  const [club] = clubId
    ? await db.select({ id: clubs.id, name: clubs.name }).from(clubs).where(eq(clubs.id, clubId))
    : [];
  if (!club) throw deny(404, "No such club.", opts);
  const [membership] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.clubId, club.id), eq(memberships.userId, user.id)));
  if (!membership) throw deny(403, "You are not a member of this club.", opts);
  if (need === "director" && !roleAllows(membership.role, "manage")) {
    throw deny(403, "Only the club's directors can do this.", opts);
  }
  return { user, club, role: membership.role };
}

export type LayoutAccess = ClubAccess & {
  layout: typeof layouts.$inferSelect;
  /** The club's track guidance, read in the same query (the analysis needs it). */
  guidance: ClubGuidance;
  /** The name of the member who created the layout, if still known. */
  creatorName: string | null;
};

/**
 * Requires access to a layout: 404 when it does not exist (or is not published and the user is
 * not a director: marshals and drivers never learn of drafts), 403 for non-members.
 */
export async function requireLayoutAccess(
  request: Request,
  layoutId: string | undefined,
  need: "member" | "director" = "member",
  opts: { api?: boolean } = {},
): Promise<LayoutAccess> {
  const user = await requireUser(request, opts);
  const [row] = layoutId ? await (await layoutQuery()).execute({ layoutId, userId: user.id }) : [];
  // The same answers, in the same order, as requireClubRole after reading the layout.
  if (!row) throw deny(404, "No such layout.", opts);
  if (!row.club) throw deny(404, "No such club.", opts);
  if (!row.role) throw deny(403, "You are not a member of this club.", opts);
  if (need === "director" && !roleAllows(row.role, "manage"))
    throw deny(403, "Only the club's directors can do this.", opts);
  if (!canSeeLayout(row.role, row.layout.status)) throw deny(404, "No such layout.", opts);
  const guidance = readGuidance({
    guidanceSet: row.club.guidanceSet,
    guidanceOverrides: row.club.guidanceOverrides,
  });
  const club = { id: row.club.id, name: row.club.name };
  return { user, club, role: row.role, layout: row.layout, guidance, creatorName: row.creatorName };
}

const creators = alias(users, "creators");

/**
 * The layout, its club (with its track guidance), the user's membership and the creator's name in
 * one round trip (a reader page's first query).
 */
function buildLayoutQuery(db: Database) {
  return db
    .select({
      layout: layouts,
      club: {
        id: clubs.id,
        name: clubs.name,
        guidanceSet: clubs.guidanceSet,
        guidanceOverrides: clubs.guidanceOverrides,
      },
      role: memberships.role,
      creatorName: creators.name,
    })
    .from(layouts)
    .leftJoin(clubs, eq(clubs.id, layouts.clubId))
    .leftJoin(creators, eq(creators.id, layouts.createdBy))
    .leftJoin(
      memberships,
      and(eq(memberships.clubId, layouts.clubId), eq(memberships.userId, sql.placeholder("userId"))),
    )
    .where(eq(layouts.id, sql.placeholder("layoutId")))
    .prepare();
}

let prepared: { db: Database; query: ReturnType<typeof buildLayoutQuery> } | undefined;

async function layoutQuery() {
  const db = await getDb();
  // A new database handle (tests, scripts) needs the query prepared again.
  if (!prepared || prepared.db !== db) prepared = { db, query: buildLayoutQuery(db) };
  return prepared.query;
}

function deny(status: number, message: string, opts: { api?: boolean }) {
  return opts.api
    ? Response.json({ error: message }, { status })
    : new Response(message, { status, statusText: message });
}
