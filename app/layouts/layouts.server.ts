/**
 * A layout's metadata: name, surface, track width, car classes, status and version. The drawing itself (the
 * layout document in layout_versions) belongs to the editor. Every change here names the version
 * it started from and bumps it, so two directors editing at once cannot overwrite each other.
 */
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { type LayoutStatus, type Role, canSeeLayout } from "~/lib/roles";
import { layouts, users } from "~/db/schema";
import type { Surface } from "~/lib/schemas/layouts";
import { RuleError } from "~/clubs/rule-error.server";
import { hasLivePublication } from "./publications.server";

export type LayoutFields = { name: string; surface: Surface; trackWidth: number; carClasses: string[] };

/** The fields as the row stores them (the class list as JSON). */
function rowFields({ carClasses, ...rest }: LayoutFields) {
  return { ...rest, carClasses: JSON.stringify(carClasses) };
}

export type LayoutListItem = {
  id: string;
  name: string;
  surface: string;
  trackWidth: number;
  status: LayoutStatus;
  version: number;
  updatedAt: Date;
};

/** The club's layouts this role may see (directors: all; marshals and drivers: published), by status then name. */
export async function listClubLayouts(clubId: string, role: Role): Promise<LayoutListItem[]> {
  const db = await getDb();
  const visible = (["draft", "published", "archived"] as const).filter((s) => canSeeLayout(role, s));
  const statusRank = sql`case ${layouts.status} when 'published' then 0 when 'draft' then 1 else 2 end`;
  return db
    .select({
      id: layouts.id,
      name: layouts.name,
      surface: layouts.surface,
      trackWidth: layouts.trackWidth,
      status: layouts.status,
      version: layouts.version,
      updatedAt: layouts.updatedAt,
    })
    .from(layouts)
    .where(and(eq(layouts.clubId, clubId), inArray(layouts.status, visible)))
    .orderBy(asc(statusRank), asc(sql`lower(${layouts.name})`), desc(layouts.updatedAt));
}

/** A new draft layout in the club; returns its id. */
export async function createLayout(
  clubId: string,
  userId: string,
  fields: LayoutFields,
): Promise<{ id: string }> {
  const db = await getDb();
  const [row] = await db
    .insert(layouts)
    .values({ clubId, createdBy: userId, ...rowFields(fields), status: "draft" })
    .returning({ id: layouts.id });
  return row;
}

/** The name of whoever created the layout (null when unknown or since removed). */
export async function layoutCreatorName(createdBy: string | null): Promise<string | null> {
  if (!createdBy) return null;
  const db = await getDb();
  const [row] = await db.select({ name: users.name }).from(users).where(eq(users.id, createdBy));
  return row?.name ?? null;
}

const STALE =
  "Someone changed this layout after you opened it. Reload the page to see the latest, then try again.";

/** Applies a change only if the layout is still at `expectedVersion` (409 otherwise); bumps the version. */
async function changeAt(
  layoutId: string,
  expectedVersion: number,
  set: Partial<typeof layouts.$inferInsert>,
  allowedFrom?: LayoutStatus[],
) {
  const db = await getDb();
  const where = [eq(layouts.id, layoutId), eq(layouts.version, expectedVersion)];
  if (allowedFrom) where.push(inArray(layouts.status, allowedFrom));
  const rows = await db
    .update(layouts)
    .set({ ...set, version: sql`${layouts.version} + 1` })
    .where(and(...where))
    .returning({ version: layouts.version, status: layouts.status });
  if (rows.length > 0) return rows[0];
  const [now] = await db
    .select({ version: layouts.version, status: layouts.status })
    .from(layouts)
    .where(eq(layouts.id, layoutId));
  if (!now) throw new RuleError(404, "No such layout.");
  if (now.version !== expectedVersion) throw new RuleError(409, STALE, "version");
  throw new RuleError(409, `This layout is ${now.status}; that change does not apply to it.`, "intent");
}

/** Renames the layout and sets its surface, track width and car classes. */
export async function updateLayoutMeta(layoutId: string, expectedVersion: number, fields: LayoutFields) {
  return changeAt(layoutId, expectedVersion, rowFields(fields));
}

/**
 * Which status each status change moves from and to. Publishing and withdrawing are not status
 * changes: they go through app/layouts/publishing.server.ts, which keeps `status` in step.
 */
export const STATUS_CHANGES = {
  archive: { from: ["draft", "published"], to: "archived" },
  unarchive: { from: ["archived"], to: "draft" },
} as const satisfies Record<string, { from: LayoutStatus[]; to: LayoutStatus }>;
export type StatusChange = keyof typeof STATUS_CHANGES;

/**
 * Moves the layout to another status (409 when it is not in a status the change starts from). A
 * layout taken out of the archive is "published" again while one of its versions is still live.
 */
export async function changeLayoutStatus(layoutId: string, expectedVersion: number, change: StatusChange) {
  const { from, to } = STATUS_CHANGES[change];
  const status = change === "unarchive" && (await hasLivePublication(layoutId)) ? "published" : to;
  return changeAt(layoutId, expectedVersion, { status }, [...from]);
}

/** Deletes the layout; its saved versions go with it (ON DELETE CASCADE). */
export async function deleteLayout(layoutId: string): Promise<{ name: string }> {
  const db = await getDb();
  const [row] = await db.delete(layouts).where(eq(layouts.id, layoutId)).returning({ name: layouts.name });
  if (!row) throw new RuleError(404, "No such layout.");
  return row;
}
