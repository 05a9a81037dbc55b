import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { verifyLogin } from "~/auth/users.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { DEMO_CLUB_NAME, DEMO_EXTRA_MEMBERS, demoRaceDate, seedDemoData } from "~/db/demo-data.server";
import { clubs, layouts, memberships, publishedVersions, users } from "~/db/schema";
import { useTestDatabase } from "./helpers/db";

const { db: getDb } = useTestDatabase();

async function counts() {
  const db = await getDb();
  return {
    users: (await db.select({ id: users.id }).from(users)).length,
    clubs: (await db.select({ id: clubs.id }).from(clubs)).length,
    memberships: (await db.select({ id: memberships.id }).from(memberships)).length,
    layouts: (await db.select({ id: layouts.id }).from(layouts)).length,
    published: (await db.select({ id: publishedVersions.id }).from(publishedVersions)).length,
  };
}

describe("demo data", () => {
  it("creates the invented club with every demo account in its role and the two layouts", async () => {
    const db = await getDb();
    const summary = await seedDemoData(db);
    const people = DEMO_ACCOUNTS.length + DEMO_EXTRA_MEMBERS.length;
    expect(summary.created).toEqual({ users: people, club: true, memberships: people, layouts: 2 });

    const [club] = await db.select().from(clubs).where(eq(clubs.name, DEMO_CLUB_NAME));
    expect(club.id).toBe(summary.clubId);
    for (const account of DEMO_ACCOUNTS) {
      const user = await verifyLogin(account.email, account.password);
      expect(user, account.email).not.toBeNull();
      const [m] = await db
        .select({ role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.clubId, club.id), eq(memberships.userId, user!.id)));
      expect(m.role).toBe(account.role);
    }
    const roles = new Set(DEMO_EXTRA_MEMBERS.map((m) => m.role));
    expect([...roles].sort()).toEqual(["director", "driver", "marshal"]);

    const rows = await db.select({ name: layouts.name, status: layouts.status }).from(layouts);
    expect(rows.sort((a, b) => a.name.localeCompare(b.name))).toEqual([
      { name: "Summer layout", status: "published" },
      { name: "Wet-weather layout", status: "draft" },
    ]);
    // The summer layout is published for a race day: a Saturday at least a week ahead, with a note.
    const published = await db
      .select({ name: layouts.name, raceDate: publishedVersions.raceDate, note: publishedVersions.note })
      .from(publishedVersions)
      .innerJoin(layouts, eq(layouts.id, publishedVersions.layoutId));
    expect(published).toHaveLength(1);
    expect(published[0]).toMatchObject({ name: "Summer layout", raceDate: demoRaceDate() });
    expect(published[0].note).toMatch(/Practice from/);
    const day = new Date(`${published[0].raceDate}T00:00:00Z`);
    expect(day.getUTCDay()).toBe(6);
    expect(day.getTime() - Date.now()).toBeGreaterThan(6 * 86400_000);
  });

  it("changes nothing when run again", async () => {
    const before = await counts();
    const summary = await seedDemoData(await getDb());
    expect(summary.created).toEqual({ users: 0, club: false, memberships: 0, layouts: 0 });
    expect(await counts()).toEqual(before);
  });

  it("gives a demo account its known password and role back after someone changed them", async () => {
    const db = await getDb();
    const marshal = DEMO_ACCOUNTS.find((a) => a.role === "marshal")!;
    const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, marshal.email));
    await db
      .update(users)
      .set({ passwordHash: "$2b$10$invalidinvalidinvalidinvalidinvalidinvalidinvalidinva" })
      .where(eq(users.id, user.id));
    await db.update(memberships).set({ role: "driver" }).where(eq(memberships.userId, user.id));
    expect(await verifyLogin(marshal.email, marshal.password)).toBeNull();

    await seedDemoData(db);

    expect(await verifyLogin(marshal.email, marshal.password)).not.toBeNull();
    const [m] = await db
      .select({ role: memberships.role })
      .from(memberships)
      .where(eq(memberships.userId, user.id));
    expect(m.role).toBe("marshal");
  });
});
