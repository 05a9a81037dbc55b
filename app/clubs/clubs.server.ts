import { count, eq, inArray } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { type Role } from "~/lib/roles";
import { clubs, memberships } from "~/db/schema";

export type MyClub = { id: string; name: string; role: Role; memberCount: number };

/** The clubs the user belongs to, with the user's role in each and the member count, by name. */
export async function listMyClubs(userId: string): Promise<MyClub[]> {
  const db = await getDb();
  const mine = await db
    .select({ id: clubs.id, name: clubs.name, role: memberships.role })
    .from(memberships)
    .innerJoin(clubs, eq(clubs.id, memberships.clubId))
    .where(eq(memberships.userId, userId))
    .orderBy(clubs.name);
  if (mine.length === 0) return [];
  const counts = await db
    .select({ clubId: memberships.clubId, n: count() })
    .from(memberships)
    .where(
      inArray(
        memberships.clubId,
        mine.map((c) => c.id),
      ),
    )
    .groupBy(memberships.clubId);
  const byClub = new Map(counts.map((c) => [c.clubId, c.n]));
  return mine.map((c) => ({ ...c, memberCount: byClub.get(c.id) ?? 0 }));
}

/** Creates a club and makes its creator the first race director, both or neither. */
export async function createClub(userId: string, name: string): Promise<{ id: string; name: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [club] = await tx.insert(clubs).values({ name }).returning({ id: clubs.id, name: clubs.name });
    await tx.insert(memberships).values({ clubId: club.id, userId, role: "director" });
    return club;
  });
}
