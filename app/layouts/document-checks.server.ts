/**
 * The checks a layout document passes before the server keeps or analyses it, beyond its schema:
 * car classes the engine knows, custom jumps it can fly, a background photo of the club's own
 * files, and an analysis within the work budget. The editor's save, the import and the analysis
 * run the same ones, so nothing is saved that the analysis then refuses. Every issue names its
 * field.
 */
import { and, eq } from "drizzle-orm";
import { budgetIssues } from "~/analysis-pool/budget";
import { CAR_PRESET_IDS, carPreset, takeoffIssues, type LayoutDocument, type LayoutIssue } from "~/analysis";
import { getDb } from "~/db/client.server";
import { files } from "~/db/schema";

/** The car classes the engine knows, as a refusal lists them. */
export const KNOWN_CLASSES = CAR_PRESET_IDS.join(", ");

/** Puts `prefix` ("document.") before a document field's path. */
const prefixed = (issues: LayoutIssue[], prefix: string) =>
  issues.map((i) => ({
    ...i,
    path: i.path === "(document)" ? prefix.replace(/\.$/, "") || i.path : prefix + i.path,
  }));

/**
 * What the engine would refuse in the document itself: unknown car classes and custom jumps
 * whose lip is no takeoff. Answered 400.
 */
export function analysisInputIssues(doc: LayoutDocument, prefix = ""): LayoutIssue[] {
  const classes = doc.carClasses.flatMap((id, i) =>
    carPreset(id)
      ? []
      : [{ path: `carClasses[${i}]`, message: `"${id}" is not a known car class (known: ${KNOWN_CLASSES})` }],
  );
  return prefixed([...classes, ...takeoffIssues(doc)], prefix);
}

/** An analysis of the whole document for its own classes over the work budget. Answered 422. */
export function documentBudgetIssues(doc: LayoutDocument, prefix = ""): LayoutIssue[] {
  return prefixed(budgetIssues(doc), prefix);
}

/** The background photo must be one of the club's files. */
export async function backgroundIssues(
  doc: LayoutDocument,
  clubId: string,
  prefix = "",
): Promise<LayoutIssue[]> {
  if (!doc.background) return [];
  const db = await getDb();
  const [row] = await db
    .select({ id: files.id })
    .from(files)
    .where(and(eq(files.id, doc.background.fileId), eq(files.clubId, clubId)));
  if (row) return [];
  return prefixed(
    [{ path: "background.fileId", message: "is not one of this club's files: upload the photo again" }],
    prefix,
  );
}

export type DocumentRefusal = { status: 400 | 422; issues: LayoutIssue[] };

/**
 * Every check a document to be saved in a club passes; null when it passes them all. A field
 * problem answers 400; only an analysis over the work budget answers 422.
 */
export async function refuseDocument(
  doc: LayoutDocument,
  clubId: string,
  prefix = "document.",
): Promise<DocumentRefusal | null> {
  const fields = [...analysisInputIssues(doc, prefix), ...(await backgroundIssues(doc, clubId, prefix))];
  const issues = [...fields, ...documentBudgetIssues(doc, prefix)];
  if (issues.length === 0) return null;
  return { status: fields.length ? 400 : 422, issues };
}

/** "sections[3].lipIndex is not a takeoff: ... (and 2 more)" */
export function describeFirstIssue(issues: LayoutIssue[]): string {
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : "";
  return `${issues[0].path} ${issues[0].message}${more}`;
}
