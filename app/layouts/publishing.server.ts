/**
 * Publishing for race day (docs/decisions/0800-publishing-model.md): a director publishes the
 * working draft as a fixed version with a race date and a note; marshals and drivers read the
 * latest published version not withdrawn; later saves stay in the draft. The layout's `status`
 * column is kept in step in the same transaction: "published" while a version is live.
 */
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { parseLayoutDocument, starterDocument, type LayoutDocument } from "~/analysis";
import { RuleError } from "~/clubs/rule-error.server";
import { getDb } from "~/db/client.server";
import { layouts, layoutVersions, publishedVersions } from "~/db/schema";

const STALE =
  "Someone changed this layout after you opened the page. Reload it to see the latest draft, then publish.";

type Tx = Parameters<Parameters<Awaited<ReturnType<typeof getDb>>["transaction"]>[0]>[0];

/**
 * The draft as it would be read: the newest stored document with the row's name, surface and width
 * laid over it. When the row differs from the stored document (details changed since the last
 * save) or nothing was ever drawn, the draft is stored as a new version first, so what is published
 * is exactly a stored version.
 */
async function snapshotDraft(tx: Tx, row: typeof layouts.$inferSelect, userId: string): Promise<number> {
  const [latest] = await tx
    .select({ number: layoutVersions.number, document: layoutVersions.document })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, row.id))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  const parsed = latest ? parseLayoutDocument(latest.document) : null;
  const stored: LayoutDocument | null = parsed?.ok ? parsed.document : null;
  if (
    latest &&
    stored &&
    stored.name === row.name &&
    stored.surface === row.surface &&
    stored.trackWidth === row.trackWidth
  )
    return latest.number;
  const base = stored ?? starterDocument(row.name, row.trackWidth);
  const document = {
    ...base,
    name: row.name,
    surface: row.surface as LayoutDocument["surface"],
    trackWidth: row.trackWidth,
  };
  const number = Math.max(row.version, latest?.number ?? 0) + 1;
  await tx.insert(layoutVersions).values({
    layoutId: row.id,
    number,
    document: JSON.stringify(document),
    note: "Stored when published",
    createdBy: userId,
  });
  await tx.update(layouts).set({ version: number, updatedAt: new Date() }).where(eq(layouts.id, row.id));
  return number;
}

/**
 * Publishes the working draft as the race-day version. Refuses (409) a page older than the layout
 * (`expectedVersion`), an archived layout, and a draft that is already the live race-day version.
 * @returns the publication's id and the published version number.
 */
export async function publishDraft(
  layoutId: string,
  expectedVersion: number,
  input: { raceDate: string; note: string },
  userId: string,
): Promise<{ id: string; versionNumber: number }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(layouts).where(eq(layouts.id, layoutId));
    if (!row) throw new RuleError(404, "No such layout.");
    if (row.version !== expectedVersion) throw new RuleError(409, STALE, "version");
    if (row.status === "archived")
      throw new RuleError(409, "This layout is archived: take it out of the archive first.", "form");
    const versionNumber = await snapshotDraft(tx, row, userId);
    const [live] = await tx
      .select({ id: publishedVersions.id })
      .from(publishedVersions)
      .where(
        and(
          eq(publishedVersions.layoutId, layoutId),
          eq(publishedVersions.versionNumber, versionNumber),
          isNull(publishedVersions.withdrawnAt),
        ),
      );
    if (live)
      throw new RuleError(
        409,
        `Version ${versionNumber} is already published. Save a change in the editor to publish a new version.`,
        "form",
      );
    const [created] = await tx
      .insert(publishedVersions)
      .values({ layoutId, versionNumber, raceDate: input.raceDate, note: input.note, publishedBy: userId })
      .returning({ id: publishedVersions.id });
    await tx.update(layouts).set({ status: "published" }).where(eq(layouts.id, layoutId));
    return { id: created.id, versionNumber };
  });
}

/**
 * Withdraws a published version with a reason (404 when it is not this layout's, 409 when already
 * withdrawn). When no published version is left live, the layout goes back to "draft".
 */
export async function withdrawPublication(
  layoutId: string,
  publicationId: string,
  reason: string,
  userId: string,
): Promise<{ versionNumber: number; stillPublished: boolean }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [found] = await tx
      .select({ versionNumber: publishedVersions.versionNumber, withdrawnAt: publishedVersions.withdrawnAt })
      .from(publishedVersions)
      .where(and(eq(publishedVersions.id, publicationId), eq(publishedVersions.layoutId, layoutId)));
    if (!found) throw new RuleError(404, "No such published version of this layout.", "publication");
    if (found.withdrawnAt)
      throw new RuleError(409, `Version ${found.versionNumber} is already withdrawn.`, "publication");
    await tx
      .update(publishedVersions)
      .set({ withdrawnAt: new Date(), withdrawnReason: reason, withdrawnBy: userId })
      .where(eq(publishedVersions.id, publicationId));
    const [left] = await tx
      .select({ n: sql<number>`count(*)` })
      .from(publishedVersions)
      .where(and(eq(publishedVersions.layoutId, layoutId), isNull(publishedVersions.withdrawnAt)));
    const stillPublished = left.n > 0;
    if (!stillPublished)
      await tx
        .update(layouts)
        .set({ status: "draft" })
        .where(and(eq(layouts.id, layoutId), eq(layouts.status, "published")));
    return { versionNumber: found.versionNumber, stillPublished };
  });
}
