/**
 * The demo data: an invented club, "Kestrel Valley Off-Road Club", with invented members of each
 * role and two layouts. No real clubs, tracks, people or brands. Running it twice changes nothing
 * the second time (users, club, memberships and layouts are looked up before they are created).
 */
import bcrypt from "bcryptjs";
import { and, desc, eq } from "drizzle-orm";
import { DEMO_LAYOUTS as DEMO_LAYOUT_DOCUMENTS } from "~/db/demo-layouts";
import { hashPassword, normaliseEmail } from "~/auth/users.server";
import type { LayoutDocument } from "~/analysis";
import type { Database } from "./client.server";
import { DEMO_ACCOUNTS, DEMO_CLUB_NAME } from "./demo-accounts";
import type { LayoutStatus, Role } from "~/lib/roles";
import { clubs, layouts, layoutVersions, memberships, publishedVersions, users } from "./schema";

export { DEMO_CLUB_NAME };

/** Password of the extra members (not printed; they make the member list look like a club's). */
const EXTRA_PASSWORD = "kestrel-member";

/** More invented members, a few of each role. */
export const DEMO_EXTRA_MEMBERS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: "ruth@kestrel.example", name: "Ruth Ashdown", role: "director" },
  { email: "tomasz@kestrel.example", name: "Tomasz Wren", role: "marshal" },
  { email: "ines@kestrel.example", name: "Ines Calder", role: "marshal" },
  { email: "jonah@kestrel.example", name: "Jonah Pike", role: "driver" },
  { email: "mei@kestrel.example", name: "Mei Lindqvist", role: "driver" },
  { email: "callum@kestrel.example", name: "Callum Reyes", role: "driver" },
  { email: "sofia@kestrel.example", name: "Sofia Brandt", role: "driver" },
];

export type DemoLayout = {
  name: string;
  status: LayoutStatus;
  surface: string;
  trackWidth: number;
  /** The full drawing, stored as the layout's first version. */
  document: LayoutDocument;
};

/** Which demo layout is published for race day and which is still a draft. */
const DEMO_LAYOUT_STATUS: Record<string, LayoutStatus> = {
  "Summer layout": "published",
  "Wet-weather layout": "draft",
};

/** The club's layouts, metadata taken from their documents (app/analysis/demo-layouts.ts). */
export const DEMO_LAYOUTS: ReadonlyArray<DemoLayout> = DEMO_LAYOUT_DOCUMENTS.map((document) => ({
  name: document.name,
  status: DEMO_LAYOUT_STATUS[document.name] ?? "draft",
  surface: document.surface,
  trackWidth: document.trackWidth,
  document,
}));

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
type Person = { email: string; name: string; role: Role; password: string; restorePassword: boolean };

export type DemoSummary = {
  clubId: string;
  created: { users: number; club: boolean; memberships: number; layouts: number };
};

/**
 * Creates (or brings back to their demo state) the demo club, its members and layouts, in one
 * transaction. The printed demo accounts get their known password and role back if someone changed
 * them while trying the demo; nothing is ever duplicated.
 */
export async function seedDemoData(db: Database): Promise<DemoSummary> {
  const people: Person[] = [
    ...DEMO_ACCOUNTS.map((a) => ({ ...a, restorePassword: true })),
    ...DEMO_EXTRA_MEMBERS.map((m) => ({ ...m, password: EXTRA_PASSWORD, restorePassword: false })),
  ];
  // Hash outside the transaction: bcrypt is slow and the transaction holds the write lock.
  const existing = new Map<string, { id: string; passwordHash: string }>();
  for (const p of people) {
    const [row] = await db
      .select({ id: users.id, passwordHash: users.passwordHash })
      .from(users)
      .where(eq(users.email, normaliseEmail(p.email)));
    if (row) existing.set(p.email, row);
  }
  const newHashes = new Map<string, string>();
  for (const p of people) {
    const row = existing.get(p.email);
    const stale = row && p.restorePassword && !(await bcrypt.compare(p.password, row.passwordHash));
    if (!row || stale) newHashes.set(p.email, await hashPassword(p.password));
  }

  return db.transaction(async (tx) => {
    const created = { users: 0, club: false, memberships: 0, layouts: 0 };
    const ids = new Map<string, string>();
    for (const p of people) {
      const row = existing.get(p.email);
      const hash = newHashes.get(p.email);
      if (row) {
        ids.set(p.email, row.id);
        if (hash) await tx.update(users).set({ passwordHash: hash }).where(eq(users.id, row.id));
        continue;
      }
      const [user] = await tx
        .insert(users)
        .values({ email: normaliseEmail(p.email), name: p.name, passwordHash: hash! })
        .returning({ id: users.id });
      ids.set(p.email, user.id);
      created.users += 1;
    }

    let [club] = await tx.select({ id: clubs.id }).from(clubs).where(eq(clubs.name, DEMO_CLUB_NAME));
    if (!club) {
      [club] = await tx.insert(clubs).values({ name: DEMO_CLUB_NAME }).returning({ id: clubs.id });
      created.club = true;
    }

    for (const p of people) {
      const userId = ids.get(p.email)!;
      const [membership] = await tx
        .select({ id: memberships.id, role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.clubId, club.id), eq(memberships.userId, userId)));
      if (!membership) {
        await tx.insert(memberships).values({ clubId: club.id, userId, role: p.role });
        created.memberships += 1;
      } else if (membership.role !== p.role) {
        await tx.update(memberships).set({ role: p.role }).where(eq(memberships.id, membership.id));
      }
    }

    const director = DEMO_ACCOUNTS.find((a) => a.role === "director")!;
    created.layouts = await seedDemoLayouts(tx, club.id, ids.get(director.email)!);
    return { clubId: club.id, created };
  });
}

/**
 * Creates the club's demo layouts that are missing (matched by name), each with its full document
 * as the first stored version; returns how many layouts it created. A demo layout found without
 * any stored document (from before documents were stored) gets its document, and the surface and
 * width that go with it, as the version its counter has reached. Nothing is duplicated.
 */
export async function seedDemoLayouts(tx: Tx, clubId: string, createdBy: string): Promise<number> {
  let count = 0;
  for (const { document, ...demo } of DEMO_LAYOUTS) {
    let [found] = await tx
      .select({ id: layouts.id, version: layouts.version })
      .from(layouts)
      .where(and(eq(layouts.clubId, clubId), eq(layouts.name, demo.name)));
    if (!found) {
      [found] = await tx
        .insert(layouts)
        .values({ clubId, createdBy, ...demo, version: 1 })
        .returning({ id: layouts.id, version: layouts.version });
      count += 1;
    }
    const [stored] = await tx
      .select({ id: layoutVersions.id })
      .from(layoutVersions)
      .where(eq(layoutVersions.layoutId, found.id))
      .limit(1);
    if (!stored) {
      await tx
        .update(layouts)
        .set({ surface: document.surface, trackWidth: document.trackWidth })
        .where(eq(layouts.id, found.id));
      await tx.insert(layoutVersions).values({
        layoutId: found.id,
        number: found.version,
        document: JSON.stringify(document),
        note: "Demo layout",
        createdBy,
      });
    }
    if (demo.status === "published") await publishDemoLayout(tx, found.id, createdBy);
  }
  return count;
}

/** The demo's race day: the first Saturday at least a week after `now`, "YYYY-MM-DD". */
export function demoRaceDate(now = Date.now()): string {
  const day = new Date(now + 7 * 24 * 60 * 60 * 1000);
  day.setUTCDate(day.getUTCDate() + ((6 - day.getUTCDay() + 7) % 7));
  return day.toISOString().slice(0, 10);
}

/** Publishes a demo layout's newest saved version for the demo's race day, unless one is published. */
async function publishDemoLayout(tx: Tx, layoutId: string, publishedBy: string) {
  const [live] = await tx
    .select({ id: publishedVersions.id })
    .from(publishedVersions)
    .where(eq(publishedVersions.layoutId, layoutId))
    .limit(1);
  if (live) return;
  const [latest] = await tx
    .select({ number: layoutVersions.number })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layoutId))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  await tx.insert(publishedVersions).values({
    layoutId,
    versionNumber: latest.number,
    raceDate: demoRaceDate(),
    note: "Club round 4 on the summer layout. Practice from 09:00, first heat 11:00. Marshals report to the driver stand by 10:30.",
    publishedBy,
  });
  await tx.update(layouts).set({ status: "published" }).where(eq(layouts.id, layoutId));
}
