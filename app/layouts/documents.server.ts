import { and, desc, eq } from "drizzle-orm";
import { LRUCache } from "lru-cache";
import { getDb } from "~/db/client.server";
import { layouts, layoutVersions } from "~/db/schema";
import { type LayoutDocument, parseLayoutDocument, starterDocument } from "~/analysis";
import { DEFAULT_CAR_CLASSES, readCarClasses } from "~/lib/car-classes";

type LayoutRow = typeof layouts.$inferSelect;

/** Thrown when a save names a version older than the stored one (answered 409 by routes). */
export class StaleVersionError extends Error {
  constructor(
    readonly expected: number,
    readonly current: number,
  ) {
    super(
      `The layout was saved by someone else meanwhile (you started from version ${expected}, it is now at ${current}).`,
    );
  }
}

/**
 * The layout's latest document. The layout row owns name, surface, track width and car classes
 * (they can be changed from the metadata form), so they are laid over the stored document. A
 * layout that has never been drawn gets the starter loop.
 */
export async function loadLayoutDocument(
  layout: LayoutRow,
): Promise<{ document: LayoutDocument; versionNumber: number | null }> {
  const db = await getDb();
  const [latest] = await db
    .select({ document: layoutVersions.document, number: layoutVersions.number })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layout.id))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  const classes = readCarClasses(layout.carClasses);
  const starter = () => starterDocument(layout.name, layout.trackWidth, classes ?? DEFAULT_CAR_CLASSES);
  let document: LayoutDocument;
  if (latest) {
    const parsed = parseLayoutDocument(latest.document);
    // A stored document was valid when saved; if a later format change broke it, start over visibly.
    document = parsed.ok ? parsed.document : starter();
  } else {
    document = starter();
  }
  return {
    document: {
      ...document,
      name: layout.name,
      surface: layout.surface as LayoutDocument["surface"],
      trackWidth: layout.trackWidth,
      carClasses: classes ?? document.carClasses,
    },
    versionNumber: latest?.number ?? null,
  };
}

/**
 * Stored versions never change (a save adds a new one), so a version's parsed document is kept by
 * layout and number, bounded by the bytes of its stored text: a warm reader page reads none.
 */
const versionDocuments = new LRUCache<string, LayoutDocument>({ maxSize: 16 * 1024 * 1024 });

/** A specific stored version's document (the caller's own copy), or null. */
export async function loadVersionDocument(layoutId: string, number: number): Promise<LayoutDocument | null> {
  const key = `${layoutId}:${number}`;
  const known = versionDocuments.get(key);
  if (known) return structuredClone(known);
  const db = await getDb();
  const [row] = await db
    .select({ document: layoutVersions.document })
    .from(layoutVersions)
    .where(and(eq(layoutVersions.layoutId, layoutId), eq(layoutVersions.number, number)));
  if (!row) return null;
  const parsed = parseLayoutDocument(row.document);
  if (!parsed.ok) return null;
  versionDocuments.set(key, structuredClone(parsed.document), { size: Math.max(1, row.document.length) });
  return parsed.document;
}

/**
 * Saves a document as a new version of the layout, only if the layout is still at `baseVersion`
 * (optimistic concurrency). Updates the row's name, surface, width and classes from the document. All in
 * one transaction: either both the version and the row change, or nothing does.
 * @throws StaleVersionError when someone saved meanwhile.
 */
export async function saveLayoutDocument(
  layoutId: string,
  baseVersion: number,
  document: LayoutDocument,
  userId: string,
  note?: string,
): Promise<{ version: number }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const updated = await tx
      .update(layouts)
      .set({
        version: baseVersion + 1,
        name: document.name,
        surface: document.surface,
        trackWidth: document.trackWidth,
        carClasses: JSON.stringify(document.carClasses),
        updatedAt: new Date(),
      })
      .where(and(eq(layouts.id, layoutId), eq(layouts.version, baseVersion)))
      .returning({ version: layouts.version });
    if (updated.length === 0) {
      const [row] = await tx
        .select({ version: layouts.version })
        .from(layouts)
        .where(eq(layouts.id, layoutId));
      throw new StaleVersionError(baseVersion, row?.version ?? -1);
    }
    await tx.insert(layoutVersions).values({
      layoutId,
      number: baseVersion + 1,
      document: JSON.stringify(document),
      note: note ?? null,
      createdBy: userId,
    });
    return { version: baseVersion + 1 };
  });
}

/**
 * Creates a new draft layout from a document (an import, or a copy saved from the editor). One
 * transaction: row and first version.
 */
export async function createLayoutFromDocument(
  clubId: string,
  document: LayoutDocument,
  userId: string,
  note = "Imported",
) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [layout] = await tx
      .insert(layouts)
      .values({
        clubId,
        name: document.name,
        surface: document.surface,
        trackWidth: document.trackWidth,
        carClasses: JSON.stringify(document.carClasses),
        status: "draft",
        version: 1,
        createdBy: userId,
      })
      .returning();
    await tx.insert(layoutVersions).values({
      layoutId: layout.id,
      number: 1,
      document: JSON.stringify(document),
      note,
      createdBy: userId,
    });
    return layout;
  });
}
