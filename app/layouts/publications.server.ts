/**
 * Reading the publications of layouts (app/layouts/publishing.server.ts writes them): each
 * layout's list, the race-day version, the club's race-day versions, the draft's facts.
 */
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { layouts, layoutVersions, memberships, publishedVersions, users } from "~/db/schema";

export type Publication = {
  id: string;
  versionNumber: number;
  raceDate: string | null;
  note: string;
  publishedAt: Date;
  publishedByName: string | null;
  withdrawnAt: Date | null;
  withdrawnReason: string | null;
};

/** Every publication of the layout, newest version first (withdrawn ones included). */
export async function listPublications(layoutId: string): Promise<Publication[]> {
  const db = await getDb();
  return db
    .select({
      id: publishedVersions.id,
      versionNumber: publishedVersions.versionNumber,
      raceDate: publishedVersions.raceDate,
      note: publishedVersions.note,
      publishedAt: publishedVersions.publishedAt,
      publishedByName: users.name,
      withdrawnAt: publishedVersions.withdrawnAt,
      withdrawnReason: publishedVersions.withdrawnReason,
    })
    .from(publishedVersions)
    .leftJoin(users, eq(users.id, publishedVersions.publishedBy))
    .where(eq(publishedVersions.layoutId, layoutId))
    .orderBy(desc(publishedVersions.versionNumber), desc(publishedVersions.publishedAt));
}

/** The race-day version: the newest publication not withdrawn, or null. */
export function currentPublication(list: readonly Publication[]): Publication | null {
  return list.find((p) => p.withdrawnAt === null) ?? null;
}

/** Whether the layout has a live published version (used when it leaves the archive). */
export async function hasLivePublication(layoutId: string): Promise<boolean> {
  const db = await getDb();
  const [row] = await db
    .select({ id: publishedVersions.id })
    .from(publishedVersions)
    .where(and(eq(publishedVersions.layoutId, layoutId), isNull(publishedVersions.withdrawnAt)))
    .limit(1);
  return row !== undefined;
}

/** The draft's newest saved version (number and time), and how many members the e-mail goes to. */
export async function draftFacts(layoutId: string, clubId: string) {
  const db = await getDb();
  const [saved] = await db
    .select({ number: layoutVersions.number, savedAt: layoutVersions.createdAt })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layoutId))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  const [members] = await db
    .select({ n: sql<number>`count(*)` })
    .from(memberships)
    .where(eq(memberships.clubId, clubId));
  return { saved: saved ?? null, memberCount: members.n };
}

/** The race-day version of each of the club's layouts that has one, by layout id. */
export async function raceDayVersions(
  clubId: string,
): Promise<Record<string, { versionNumber: number; raceDate: string | null }>> {
  const db = await getDb();
  const rows = await db
    .select({
      layoutId: publishedVersions.layoutId,
      versionNumber: publishedVersions.versionNumber,
      raceDate: publishedVersions.raceDate,
    })
    .from(publishedVersions)
    .innerJoin(layouts, eq(layouts.id, publishedVersions.layoutId))
    .where(and(eq(layouts.clubId, clubId), isNull(publishedVersions.withdrawnAt)))
    .orderBy(desc(publishedVersions.versionNumber));
  const out: Record<string, { versionNumber: number; raceDate: string | null }> = {};
  for (const r of rows) out[r.layoutId] ??= { versionNumber: r.versionNumber, raceDate: r.raceDate };
  return out;
}
