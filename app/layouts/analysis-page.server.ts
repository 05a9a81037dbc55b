/**
 * What the layout page and the jump page show of an analysis: the chosen class and skill (from the
 * query, falling back to the layout's first class and "club" with a note naming the parameter),
 * and the parts of the result the page draws, trimmed so the page does not carry every class's
 * speed samples.
 */
import {
  type ClassAnalysis,
  type SkillLevel,
  carPreset,
  SKILL_LEVELS,
  wordList,
  type LayoutDocument,
} from "~/analysis";
import type { SummaryData } from "~/components/analysis/summary-data";
import type { layouts } from "~/db/schema";
import { AnalysisBudgetError, AnalysisBusyError } from "~/analysis-pool/errors";
import type { CarOption, ReaderChoice } from "~/cars/reader-choice.server";
import type { ClubGuidance } from "~/clubs/guidance.server";
import {
  AnalysisInputError,
  analyseStoredLayout,
  overlayFor,
  parseSkill,
  type LayoutRef,
} from "./analysis.server";
import { markUnchanging } from "~/lib/html-cache.server";
import { packOverlay, type PackedOverlay } from "~/lib/packed-line";
import { analysisMemo } from "./analysis-memo.server";
import { loadLayoutDocument } from "./documents.server";
import { savedSource, type Reading } from "./reading.server";

type LayoutRow = typeof layouts.$inferSelect;

export interface PageAnalysis {
  document: LayoutDocument;
  classId: string;
  skill: SkillLevel;
  classes: { classId: string; label: string }[];
  /** The car picker's value (a class id or "profile:<id>") and what it offers. */
  car: string;
  cars: CarOption[];
  /** Plain-words notes about query parameters that were not understood. */
  problems: string[];
  /** The analysis, or why it could not be made. */
  result:
    | { ok: true; summary: SummaryData; chosen: ClassAnalysis; overlay: PackedOverlay; hit: boolean }
    | { ok: false; message: string };
}

/**
 * Runs (or recalls) the analysis of the version read with the reader's car and skill
 * (app/layouts/reading.server.ts, app/cars/reader-choice.server.ts); an own car is analysed beside
 * the layout's classes. Without `ctx`, the draft with class and skill read from the query.
 */
export async function pageAnalysis(
  layout: LayoutRow,
  query: URLSearchParams,
  ctx?: { reading: Reading; choice: ReaderChoice; guidance?: ClubGuidance },
): Promise<PageAnalysis> {
  if (ctx) return versionAnalysis(layout, ctx.reading, ctx.choice, ctx.guidance);
  const { document } = await loadLayoutDocument(layout);
  const problems: string[] = [];
  const classes = document.carClasses.map((id) => ({ classId: id, label: carPreset(id)?.label ?? id }));
  let classId = document.carClasses[0];
  const askedClass = query.get("class");
  if (askedClass) {
    if (document.carClasses.includes(askedClass)) classId = askedClass;
    else
      problems.push(
        `class: "${askedClass.slice(0, 40)}" is not one of this layout's car classes; showing ${classes[0].label}.`,
      );
  }
  let skill: SkillLevel = "club";
  try {
    skill = parseSkill(query.get("skill"), "skill");
  } catch (error) {
    if (!(error instanceof AnalysisInputError)) throw error;
    problems.push(`skill: must be ${wordList(SKILL_LEVELS)}; showing ${skill}.`);
  }
  const cars = classes.map((c) => ({ value: c.classId, label: c.label, own: false }));
  const base = { document, classId, skill, classes, problems, car: classId, cars };
  return withResult(base, () => analyseStoredLayout(layout, { skill, draft: document }));
}

/** The analysis of the version read with the reader's choice (also the share link's pages). */
export async function versionAnalysis(
  layout: LayoutRef,
  reading: Pick<Reading, "kind" | "number" | "document">,
  choice: Omit<ReaderChoice, "label">,
  guidance?: ClubGuidance,
): Promise<PageAnalysis> {
  const { document } = reading;
  const classes = document.carClasses.map((id) => ({ classId: id, label: carPreset(id)?.label ?? id }));
  if (choice.own) classes.push({ classId: choice.own.classId, label: choice.own.car.label });
  const base = {
    document,
    classId: choice.classId,
    skill: choice.skill,
    classes,
    problems: choice.problems,
    car: choice.car,
    cars: choice.options,
  };
  const own = choice.own;
  return withResult(base, () =>
    analyseStoredLayout(layout, {
      skill: choice.skill,
      guidance,
      classIds: own ? [...document.carClasses, own.classId] : undefined,
      cars: own ? { [own.classId]: own.car } : undefined,
      saved: savedSource(reading),
      // The document is read once: a miss analyses the one the reading holds.
      draft: reading.kind === "draft" ? document : undefined,
    }),
  );
}

async function withResult(
  base: Omit<PageAnalysis, "result">,
  analyse: () => ReturnType<typeof analyseStoredLayout>,
): Promise<PageAnalysis> {
  const { classId, skill } = base;
  try {
    const run = await analyse();
    // Made once per memo entry, class and skill; marked unchanging so page keys hash them once.
    const made = analysisMemo.made(run.entry, `page:${classId}:${skill}`, () => {
      const a = run.analysis;
      const chosen = a.classes.find((c) => c.classId === classId) ?? a.classes[0];
      const summary: SummaryData = {
        lapLength: a.lapLength,
        closure: a.closure,
        trackWidth: a.trackWidth,
        startStraight: a.startStraight,
        note: a.note,
        rules: a.rules,
        classes: a.classes.map(({ classId: id, label, lapTime, speed, cannotClear, tightTurns }) => ({
          classId: id,
          label,
          lapTime,
          speed,
          cannotClear,
          tightTurns,
        })),
      };
      // The line as one text to the centimetre: the page's components get it unpacked (app/lib/packed-line.ts).
      const overlay = packOverlay(overlayFor(run, chosen.classId, skill));
      return {
        summary: markUnchanging(summary),
        // The plan's speeds travel in the overlay; the page shows the class's label and jumps.
        chosen: markUnchanging({ ...chosen, lineSpeed: [] }),
        overlay: markUnchanging(overlay),
      };
    });
    return { ...base, result: { ok: true, ...made, hit: run.hit } };
  } catch (error) {
    if (error instanceof AnalysisInputError)
      return { ...base, result: { ok: false, message: `The layout cannot be analysed: ${error.message}.` } };
    if (error instanceof RangeError || error instanceof AnalysisBudgetError)
      return { ...base, result: { ok: false, message: `The layout cannot be analysed: ${error.message}.` } };
    if (error instanceof AnalysisBusyError)
      return { ...base, result: { ok: false, message: `The analysis is not ready: ${error.message}` } };
    throw error;
  }
}
