/**
 * Read-only links to a published version that work signed out
 * (docs/decisions/0801-share-links.md). The token is 32 random bytes shown once; only its
 * SHA-256 is stored. A link stops working when revoked, when its version is withdrawn, and while
 * the layout is archived; all three answer 404 like an unknown token.
 */
import { and, desc, eq, isNull, ne } from "drizzle-orm";
import { parseLayoutDocument, type LayoutDocument } from "~/analysis";
import { hashLinkToken, looksLikeLinkToken, newLinkToken } from "~/clubs/tokens.server";
import { RuleError } from "~/clubs/rule-error.server";
import { getDb } from "~/db/client.server";
import { clubs, layouts, layoutVersions, publishedVersions, shareLinks, users } from "~/db/schema";

export type ShareLinkRow = {
  id: string;
  versionNumber: number;
  createdAt: Date;
  createdByName: string | null;
  revokedAt: Date | null;
  /** False once revoked or once its version was withdrawn. */
  live: boolean;
};

/** The layout's share links, newest first. */
export async function listShareLinks(layoutId: string): Promise<ShareLinkRow[]> {
  const db = await getDb();
  const rows = await db
    .select({
      id: shareLinks.id,
      versionNumber: publishedVersions.versionNumber,
      createdAt: shareLinks.createdAt,
      createdByName: users.name,
      revokedAt: shareLinks.revokedAt,
      withdrawnAt: publishedVersions.withdrawnAt,
    })
    .from(shareLinks)
    .innerJoin(publishedVersions, eq(publishedVersions.id, shareLinks.publicationId))
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(shareLinks.layoutId, layoutId))
    .orderBy(desc(shareLinks.createdAt));
  return rows.map(({ withdrawnAt, ...r }) => ({ ...r, live: !r.revokedAt && !withdrawnAt }));
}

/**
 * A new link to a live published version of the layout (404 when it is not this layout's, 409 when
 * withdrawn). Returns the token: it is never shown again.
 */
export async function createShareLink(
  layoutId: string,
  publicationId: string,
  userId: string,
): Promise<{ id: string; token: string; versionNumber: number }> {
  const db = await getDb();
  const [publication] = await db
    .select({ versionNumber: publishedVersions.versionNumber, withdrawnAt: publishedVersions.withdrawnAt })
    .from(publishedVersions)
    .where(and(eq(publishedVersions.id, publicationId), eq(publishedVersions.layoutId, layoutId)));
  if (!publication) throw new RuleError(404, "No such published version of this layout.", "publication");
  if (publication.withdrawnAt)
    throw new RuleError(
      409,
      `Version ${publication.versionNumber} is withdrawn: it cannot be shared.`,
      "publication",
    );
  const { token, hash } = newLinkToken();
  const [row] = await db
    .insert(shareLinks)
    .values({ layoutId, publicationId, tokenHash: hash, createdBy: userId })
    .returning({ id: shareLinks.id });
  return { id: row.id, token, versionNumber: publication.versionNumber };
}

/** Revokes one of the layout's links (404 when not its own, 409 when already revoked). */
export async function revokeShareLink(layoutId: string, linkId: string): Promise<void> {
  const db = await getDb();
  const rows = await db
    .update(shareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(shareLinks.id, linkId), eq(shareLinks.layoutId, layoutId), isNull(shareLinks.revokedAt)))
    .returning({ id: shareLinks.id });
  if (rows.length > 0) return;
  const [found] = await db
    .select({ id: shareLinks.id })
    .from(shareLinks)
    .where(and(eq(shareLinks.id, linkId), eq(shareLinks.layoutId, layoutId)));
  throw found
    ? new RuleError(409, "That link is already revoked.", "link")
    : new RuleError(404, "No such share link of this layout.", "link");
}

/** What a share link shows: the layout's name, its club's name and the published version. Nothing about members. */
export type SharedVersion = {
  layout: { id: string; clubId: string; name: string; version: number };
  clubName: string;
  publication: { versionNumber: number; raceDate: string | null; note: string };
  document: LayoutDocument;
};

/** The version a token opens, or null (malformed, unknown, revoked, withdrawn or archived). */
export async function resolveShareToken(token: string | undefined): Promise<SharedVersion | null> {
  if (!looksLikeLinkToken(token)) return null;
  const db = await getDb();
  const [row] = await db
    .select({
      layoutId: layouts.id,
      clubId: layouts.clubId,
      name: layouts.name,
      version: layouts.version,
      clubName: clubs.name,
      versionNumber: publishedVersions.versionNumber,
      raceDate: publishedVersions.raceDate,
      note: publishedVersions.note,
      document: layoutVersions.document,
    })
    .from(shareLinks)
    .innerJoin(publishedVersions, eq(publishedVersions.id, shareLinks.publicationId))
    .innerJoin(layouts, eq(layouts.id, shareLinks.layoutId))
    .innerJoin(clubs, eq(clubs.id, layouts.clubId))
    .innerJoin(
      layoutVersions,
      and(
        eq(layoutVersions.layoutId, publishedVersions.layoutId),
        eq(layoutVersions.number, publishedVersions.versionNumber),
      ),
    )
    .where(
      and(
        eq(shareLinks.tokenHash, hashLinkToken(token)),
        isNull(shareLinks.revokedAt),
        isNull(publishedVersions.withdrawnAt),
        ne(layouts.status, "archived"),
      ),
    );
  if (!row) return null;
  const parsed = parseLayoutDocument(row.document);
  if (!parsed.ok) return null;
  return {
    layout: { id: row.layoutId, clubId: row.clubId, name: parsed.document.name, version: row.version },
    clubName: row.clubName,
    publication: { versionNumber: row.versionNumber, raceDate: row.raceDate, note: row.note },
    document: parsed.document,
  };
}
