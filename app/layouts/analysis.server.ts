/**
 * Runs the layout analysis for the pages and the API: checks the requested classes and skill,
 * applies the club's track guidance, and goes through the process-wide memo
 * (analysis-memo.server.ts) so a repeat costs nothing. The engine runs in the worker pool
 * (app/analysis-pool/pool.server.ts), whose workers keep each jump's costly parts, so an edited
 * draft recomputes only what changed.
 */
import {
  carPreset,
  SKILL_LEVELS,
  type LayoutAnalysis,
  type SkillLevel,
  buildOverlay,
  canonicalJson,
  type AnalysisOverlay,
  type CarParams,
  type LayoutDocument,
  type LayoutIssue,
} from "~/analysis";
import { runAnalysis } from "~/analysis-pool/pool.server";
import { analysisMemo, type AnalysisInputs, type MemoEntry } from "./analysis-memo.server";
import { loadClubGuidance, verdictThresholds, type ClubGuidance } from "~/clubs/guidance.server";
import { eq } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { layouts } from "~/db/schema";
import { analysisInputIssues, KNOWN_CLASSES } from "./document-checks.server";
import { loadLayoutDocument } from "./documents.server";

type LayoutRow = typeof layouts.$inferSelect;

/** A request that names a field wrongly: answered 400 with the issues. */
export class AnalysisInputError extends Error {
  constructor(readonly issues: LayoutIssue[]) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join("; "));
    this.name = "AnalysisInputError";
  }
}

/** Checks a skill level given as text (a query parameter or a JSON field named `field`). */
export function parseSkill(value: unknown, field: string, fallback: SkillLevel = "club"): SkillLevel {
  if (value === undefined || value === null || value === "") return fallback;
  if (typeof value === "string" && (SKILL_LEVELS as readonly string[]).includes(value))
    return value as SkillLevel;
  throw new AnalysisInputError([{ path: field, message: `must be one of ${SKILL_LEVELS.join(", ")}` }]);
}

/** Checks a car class id (a query parameter or a JSON field named `field`); undefined when absent. */
export function parseClassId(value: unknown, field: string): string | undefined {
  if (value === undefined || value === null || value === "") return undefined;
  if (typeof value === "string" && carPreset(value)) return value;
  const shown = typeof value === "string" ? `"${value.slice(0, 40)}"` : "that value";
  throw new AnalysisInputError([
    { path: field, message: `${shown} is not a known car class (known: ${KNOWN_CLASSES})` },
  ]);
}

export interface AnalysisRun {
  analysis: LayoutAnalysis;
  entry: MemoEntry;
  /** True when the memo already held the result. */
  hit: boolean;
}

/**
 * Analyses a document (a draft or a stored layout's) for the given classes (default: the
 * document's own) with a club's guidance (default: the document's own set, no overrides).
 * @param fieldPrefix how the document's fields are named in issues ("document." in the API).
 * @param owner the account asking (user id), held to its own number of analyses at once.
 * @throws AnalysisInputError naming the field for an unknown class or a custom jump the engine
 * cannot fly; the pool's AnalysisBudgetError and AnalysisBusyError.
 */
export async function analyseDocument(
  document: LayoutDocument,
  opts: {
    classIds?: readonly string[];
    skill: SkillLevel;
    guidance?: ClubGuidance;
    fieldPrefix?: string;
    owner?: string;
    /** Own cars by class id; their ids carry the profile's content hash, so the memo keys stay honest. */
    cars?: Readonly<Record<string, CarParams>>;
  },
): Promise<AnalysisRun> {
  const issues = analysisInputIssues(document, opts.fieldPrefix ?? "");
  if (issues.length) throw new AnalysisInputError(issues);
  const guidance = opts.guidance ?? { guidanceSet: document.guidance, overrides: {} };
  const inputs: AnalysisInputs = {
    document,
    classIds: opts.classIds ?? document.carClasses,
    skill: opts.skill,
    guidance: guidance.guidanceSet,
    overrides: guidance.overrides,
    ...(guidance.verdict ? { verdict: guidance.verdict } : {}),
  };
  const { entry, hit } = await analysisMemo.recall(inputs, () =>
    runAnalysis(
      { ...document, guidance: guidance.guidanceSet },
      {
        classIds: inputs.classIds,
        skill: inputs.skill,
        overrides: guidance.overrides,
        thresholds: verdictThresholds(guidance),
        owner: opts.owner,
        cars: opts.cars,
      },
    ),
  );
  return { analysis: entry.value, entry, hit };
}

/** What the memo needs to know of a stored layout; the rest is read only when the memo misses. */
export type LayoutRef = Pick<LayoutRow, "id" | "clubId" | "version">;

async function fullRow(layout: LayoutRef | LayoutRow): Promise<LayoutRow> {
  if ("createdAt" in layout) return layout;
  const db = await getDb();
  const [row] = await db.select().from(layouts).where(eq(layouts.id, layout.id));
  if (!row) throw Response.json({ error: "No such layout." }, { status: 404 });
  return row;
}

/**
 * A stored layout's analysis at its current version (or, with `opts.saved`, at one saved version,
 * e.g. the published one) with its club's guidance. A warm repeat is answered from the memo by the
 * layout's id and version, without reading the document.
 * @param opts.classIds undefined for the document's own classes; opts.guidance when already read;
 *   opts.cars own cars by class id; opts.owner the account asking (see analyseDocument).
 */
export async function analyseStoredLayout(
  layout: LayoutRef | LayoutRow,
  opts: {
    classIds?: readonly string[];
    skill: SkillLevel;
    guidance?: ClubGuidance;
    cars?: Readonly<Record<string, CarParams>>;
    owner?: string;
    saved?: { number: number; load: () => Promise<LayoutDocument> };
    /** The working draft's document when the caller has already read it (read once). */
    draft?: LayoutDocument;
  },
): Promise<AnalysisRun & { guidance: ClubGuidance }> {
  const guidance = opts.guidance ?? (await loadClubGuidance(layout.clubId));
  const which = opts.saved ? `saved:${opts.saved.number}` : layout.version;
  const aliasOf = (version: number | string) =>
    canonicalJson([layout.id, version, guidance, opts.classIds ?? "*", opts.skill]);
  const known = analysisMemo.byAlias(aliasOf(which));
  if (known) return { analysis: known.value, entry: known, hit: true, guidance };
  const settings = {
    classIds: opts.classIds,
    skill: opts.skill,
    guidance,
    cars: opts.cars,
    owner: opts.owner,
  };
  if (opts.saved) {
    const run = await analyseDocument(await opts.saved.load(), settings);
    analysisMemo.setAlias(aliasOf(which), run.entry);
    return { ...run, guidance };
  }
  const document = opts.draft ?? (await loadLayoutDocument(await fullRow(layout))).document;
  const run = await analyseDocument(document, settings);
  analysisMemo.setAlias(aliasOf(layout.version), run.entry);
  return { ...run, guidance };
}

/** The overlay of a class (default the first analysed), made once per memo entry. */
export function overlayFor(
  run: AnalysisRun,
  classId: string | undefined,
  skill: SkillLevel,
): AnalysisOverlay {
  const id = classId ?? run.analysis.classes[0].classId;
  return analysisMemo.made(run.entry, `overlay:${id}:${skill}`, () => buildOverlay(run.analysis, id, skill));
}
