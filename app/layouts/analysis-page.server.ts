/**
 * What the layout page and the jump page show of an analysis: the chosen class and skill (from the
 * query, falling back to the layout's first class and "club" with a note naming the parameter),
 * and the parts of the result the page draws, trimmed so the page does not carry every class's
 * speed samples.
 */
import type { ClassAnalysis, SkillLevel } from "~/analysis";
import type { SummaryData } from "~/components/analysis/summary-data";
import { carPreset, SKILL_LEVELS, wordList } from "~/analysis";
import type { layouts } from "~/db/schema";
import type { AnalysisOverlay } from "~/analysis";
import type { LayoutDocument } from "~/analysis";
import { AnalysisBudgetError, AnalysisBusyError } from "~/analysis-pool/errors";
import { AnalysisInputError, analyseStoredLayout, overlayFor, parseSkill } from "./analysis.server";
import { loadLayoutDocument } from "./documents.server";

type LayoutRow = typeof layouts.$inferSelect;

export interface PageAnalysis {
  document: LayoutDocument;
  classId: string;
  skill: SkillLevel;
  classes: { classId: string; label: string }[];
  /** Plain-words notes about query parameters that were not understood. */
  problems: string[];
  /** The analysis, or why it could not be made. */
  result:
    | { ok: true; summary: SummaryData; chosen: ClassAnalysis; overlay: AnalysisOverlay; hit: boolean }
    | { ok: false; message: string };
}

const round2 = (v: number) => Math.round(v * 100) / 100;

/** The overlay with plan coordinates and speeds to the centimetre (a smaller page, same drawing). */
function compactOverlay(o: AnalysisOverlay): AnalysisOverlay {
  return {
    ...o,
    line: { ...o.line, x: o.line.x.map(round2), y: o.line.y.map(round2), speed: o.line.speed.map(round2) },
  };
}

/** Reads class and skill from the page's query and runs (or recalls) the analysis. */
export async function pageAnalysis(layout: LayoutRow, query: URLSearchParams): Promise<PageAnalysis> {
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
  const base = { document, classId, skill, classes, problems };
  try {
    const run = await analyseStoredLayout(layout, { skill });
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
    const overlay = compactOverlay(overlayFor(run, chosen.classId, skill));
    return { ...base, result: { ok: true, summary, chosen, overlay, hit: run.hit } };
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
