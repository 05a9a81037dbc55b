import { and, asc, count, desc, eq, or, sql, type SQL } from "drizzle-orm";
import { getDb, type Database } from "~/db/client.server";
import { type Role, ROLE_LABELS } from "~/lib/roles";
import { memberships, users } from "~/db/schema";
import type { MemberQuery } from "~/lib/schemas/clubs";
import { RuleError } from "./rule-error.server";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

export type MemberRow = {
  id: string;
  userId: string;
  name: string;
  /** Only filled in for directors (see docs/decisions/0351-member-emails-for-directors.md). */
  email: string | null;
  role: Role;
  joinedAt: Date;
};

/** Directors first, then marshals, then drivers: the order a club reads its roster in. */
const roleRank = sql<number>`case ${memberships.role} when 'director' then 0 when 'marshal' then 1 else 2 end`;

/**
 * The club's members, sorted and filtered as the members table asks. The text filter matches the
 * name, and the e-mail address only when the reader may see addresses.
 */
export async function listMembers(
  clubId: string,
  query: MemberQuery,
  opts: { withEmail: boolean },
): Promise<MemberRow[]> {
  const db = await getDb();
  const where: SQL[] = [eq(memberships.clubId, clubId)];
  if (query.role !== "all") where.push(eq(memberships.role, query.role));
  if (query.q) {
    const pattern = `%${query.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    const byName = sql`lower(${users.name}) like ${pattern} escape '\\'`;
    const byEmail = sql`${users.email} like ${pattern} escape '\\'`;
    where.push(opts.withEmail ? or(byName, byEmail)! : byName);
  }
  const sortable = opts.withEmail || query.sort !== "email" ? query.sort : "name";
  const key = {
    name: sql`lower(${users.name})`,
    email: users.email,
    role: roleRank,
    joined: memberships.createdAt,
  }[sortable];
  const order = query.dir === "desc" ? desc : asc;
  const rows = await db
    .select({
      id: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(...where))
    .orderBy(order(key), asc(sql`lower(${users.name})`), asc(memberships.id));
  return rows.map((r) => ({ ...r, email: opts.withEmail ? r.email : null }));
}

/** Number of race directors the club has, read inside the caller's transaction. */
async function directorCount(tx: Tx, clubId: string): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.role, "director")));
  return row?.n ?? 0;
}

async function findMember(tx: Tx, clubId: string, memberId: string) {
  const [member] = await tx
    .select({ id: memberships.id, role: memberships.role, userId: memberships.userId, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.id, memberId), eq(memberships.clubId, clubId)));
  if (!member) throw new RuleError(404, "No such member in this club.", "memberId");
  return member;
}

const LAST_DIRECTOR = "A club always keeps at least one race director. Make another member a director first.";

/**
 * Changes a member's role. Refuses (409) a change that would leave the club without a director;
 * the check runs after the write, inside one transaction, so two directors demoting each other at
 * the same moment cannot both succeed.
 */
export async function changeMemberRole(
  clubId: string,
  memberId: string,
  role: Role,
): Promise<{ name: string; role: Role }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const member = await findMember(tx, clubId, memberId);
    if (member.role === role) return { name: member.name, role };
    await tx.update(memberships).set({ role }).where(eq(memberships.id, member.id));
    if ((await directorCount(tx, clubId)) === 0) throw new RuleError(409, LAST_DIRECTOR, "role");
    return { name: member.name, role };
  });
}

/** Removes a member from the club. Refuses (409) removing the last director. */
export async function removeMember(
  clubId: string,
  memberId: string,
): Promise<{ name: string; userId: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const member = await findMember(tx, clubId, memberId);
    await tx.delete(memberships).where(eq(memberships.id, member.id));
    if ((await directorCount(tx, clubId)) === 0) throw new RuleError(409, LAST_DIRECTOR, "memberId");
    return { name: member.name, userId: member.userId };
  });
}

export function roleChangeNotice(name: string, role: Role): string {
  return `${name} is now ${role === "director" ? "a race director" : `a ${ROLE_LABELS[role].toLowerCase()}`}.`;
}

/** Whether the user already belongs to the club. */
export async function isMember(clubId: string, userId: string): Promise<boolean> {
  const db = await getDb();
  const [row] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId)));
  return Boolean(row);
}
