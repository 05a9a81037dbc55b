/**
 * The compare page's data: two versions of a layout (`from` and `to`: a saved version's number or
 * "draft"), their section changes, how each car class's lap and jump verdicts moved, and the
 * centre lines to draw the changes on the plan. Marshals and drivers compare published versions
 * only (404 otherwise); directors any saved version and the working draft.
 */
import {
  compareAnalyses,
  compareDocuments,
  type LayoutAnalysis,
  type LayoutDocument,
  type SectionDiffKind,
  type SkillLevel,
} from "~/analysis";
import type { layouts } from "~/db/schema";
import type { Role } from "~/lib/roles";
import { raceDateText } from "~/lib/race-date";
import { analyseStoredLayout } from "./analysis.server";
import { loadLayoutDocument, loadVersionDocument } from "./documents.server";
import { currentPublication, listPublications } from "./publications.server";
import { parseVersionParam } from "./reading.server";

type LayoutRow = typeof layouts.$inferSelect;

export type CompareLine = { sectionId: string; kind: SectionDiffKind; points: [number, number][] };

const notFound = (message: string) => new Response(message, { status: 404, statusText: message });
const round2 = (v: number) => Math.round(v * 100) / 100;

/** Each section's stretch of the analysed centre line, as a polyline in plan metres. */
function sectionLines(
  a: LayoutAnalysis,
  doc: LayoutDocument,
  kindOf: (id: string) => SectionDiffKind | null,
) {
  const out: CompareLine[] = [];
  let current: CompareLine | null = null;
  a.line.x.forEach((x, k) => {
    const id = doc.sections[a.line.sectionIndex[k]]?.id;
    const kind = id ? kindOf(id) : null;
    const point: [number, number] = [round2(x), round2(a.line.y[k])];
    if (current && current.sectionId === id) current.points.push(point);
    else {
      if (current) current.points.push(point); // joins the stretches without a gap
      current = id && kind ? { sectionId: id, kind, points: [point] } : null;
      if (current) out.push(current);
    }
  });
  return out.filter((l) => l.points.length > 1);
}

/** Compares two versions for a reader with this role; `query` holds `from`, `to` and nothing else needed. */
export async function compareVersions(
  layout: LayoutRow,
  role: Role,
  query: URLSearchParams,
  skill: SkillLevel,
) {
  const publications = await listPublications(layout.id);
  const current = currentPublication(publications);
  const director = role === "director";
  const published = new Set(publications.map((p) => p.versionNumber));
  const options = [
    ...(director ? [{ value: "draft", label: "Working draft" }] : []),
    ...publications.map((p) => ({
      value: String(p.versionNumber),
      label: `Version ${p.versionNumber}, race day ${raceDateText(p.raceDate)}${p.withdrawnAt ? " (withdrawn)" : ""}`,
    })),
  ];
  const older = publications.find((p) => current && p.versionNumber < current.versionNumber);
  const askedFrom = parseVersionParam(query.get("from"));
  const askedTo = parseVersionParam(query.get("to"));
  const to = askedTo ?? (director ? "draft" : (current?.versionNumber ?? null));
  const from = askedFrom ?? (director ? (current?.versionNumber ?? null) : (older?.versionNumber ?? null));
  if (to === null || from === null) return { options, from, to, result: null };
  for (const v of [from, to])
    if (!director && (v === "draft" || !published.has(v))) throw notFound("No such version of this layout.");

  const load = async (v: number | "draft") => {
    if (v === "draft") {
      const doc = (await loadLayoutDocument(layout)).document;
      return { doc, run: await analyseStoredLayout(layout, { skill, draft: doc }) };
    }
    const doc = await loadVersionDocument(layout.id, v);
    if (!doc) throw notFound(`There is no saved version ${v} of this layout.`);
    return {
      doc,
      run: await analyseStoredLayout(layout, { skill, saved: { number: v, load: async () => doc } }),
    };
  };
  const [a, b] = [await load(from), await load(to)];
  const documents = compareDocuments(a.doc, b.doc);
  const kinds = new Map(documents.sections.map((s) => [s.sectionId, s.kind]));
  const lines = [
    ...sectionLines(b.run.analysis, b.doc, (id) => kinds.get(id) ?? null),
    ...sectionLines(a.run.analysis, a.doc, (id) => (kinds.get(id) === "removed" ? "removed" : null)),
  ];
  return {
    options,
    from,
    to,
    result: {
      documents,
      classes: compareAnalyses(a.run.analysis, b.run.analysis, skill),
      lines,
      jumpNumbers: Object.fromEntries(
        b.doc.sections.filter((s) => s.kind === "jump").map((s, i) => [s.id, i + 1]),
      ) as Record<string, number>,
    },
  };
}
export type CompareData = Awaited<ReturnType<typeof compareVersions>>;
