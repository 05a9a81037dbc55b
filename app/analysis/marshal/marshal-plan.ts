/**
 * The marshal risk of a layout in one call (issue 11; engine.md section 7): overshoot and run-off
 * zones, hotspots with scores and reasons, the layout's own marshal points with their stretch,
 * what to watch and warnings, and on request a suggested plan. Built on a finished layout
 * analysis (analyseLayout) of the same document. Plain JSON data (marshal-types.ts).
 */
import type { LayoutDocument } from "../format/layout-document";
import { carPreset, type CarParams } from "../format/cars";
import type { LayoutAnalysis } from "../layout/layout-analysis-types";
import type { GuidanceValues } from "../track/rules";
import type { JumpProfile } from "../track/jump-profile";
import { ballisticJumpWindow, type JumpWindow } from "../track/lap-jumps";
import { findHotspots } from "./hotspots";
import type { MarshalPlan, MarshalPointReport, SuggestedPlan } from "./marshal-types";
import { placeMarshals } from "./placement";
import { pointReports, type PointContext } from "./points";
import { marshalSettings, type MarshalSettings } from "./settings";
import { marshalSpots } from "./spots";
import { indexTrack } from "./track-index";
import { lapAhead, trackMarks } from "./track-marks";
import { MARSHAL_NOTE } from "./words";
import { zoneContents } from "./zone-contents";
import { jumpZones, turnZones, type ZoneClass } from "./zones";

export interface MarshalOptions {
  /** Classes whose zones and hotspots count (default: every class of the analysis); the worst counts. */
  classIds?: readonly string[];
  /** A club's own car classes by id, as given to analyseLayout (checked before the presets). */
  cars?: Readonly<Record<string, CarParams>>;
  /** A club's own values for the marshal settings (the rest keep their defaults). */
  settings?: Partial<MarshalSettings>;
  /** Also suggest a set of points (settings.heatSize of them). */
  suggest?: boolean;
}

function zoneClasses(analysis: LayoutAnalysis, options: MarshalOptions): ZoneClass[] {
  const field = options.classIds ? "classIds" : "analysis.classes";
  const ids = options.classIds ?? analysis.classes.map((c) => c.classId);
  if (ids.length === 0) throw new RangeError(`${field}: must name at least one car class`);
  return ids.map((id, i) => {
    const cls = analysis.classes.find((c) => c.classId === id);
    if (!cls) throw new RangeError(`${field}[${i}]: the analysis has no class "${id}"`);
    const own =
      options.cars && Object.prototype.hasOwnProperty.call(options.cars, id) ? options.cars[id] : undefined;
    const car = own ?? carPreset(id);
    if (!car) throw new RangeError(`${field}[${i}]: unknown car class "${id}" (pass the club's cars)`);
    return { id, car, analysis: cls };
  });
}

/**
 * The marshal risk of a layout from its analysis.
 * @param doc the layout document the analysis was made from.
 * @param analysis `analyseLayout(doc, ...)`; its rule values (with the club's overrides) set the hotspot limits.
 * @returns zones and positions in plan metres, lap distances m, speeds m/s, angles deg.
 * @throws RangeError naming the field for an unknown class, a bad setting or an analysis of another layout.
 */
export function marshalPlan(
  doc: LayoutDocument,
  analysis: LayoutAnalysis,
  options: MarshalOptions = {},
): MarshalPlan {
  const settings = marshalSettings(options.settings);
  return marshalRisk(doc, analysis, zoneClasses(analysis, options), settings, {
    suggest: options.suggest ?? false,
  });
}

/**
 * The marshal plan for classes whose cars are known (the whole-layout analysis passes its own).
 * @param analysis the analysis so far: its plan, rules and classes.
 */
export function marshalRisk(
  doc: LayoutDocument,
  analysis: Omit<LayoutAnalysis, "risk">,
  classes: readonly ZoneClass[],
  settings: MarshalSettings,
  how: { suggest: boolean; jumpWindow?: (profile: JumpProfile) => JumpWindow },
): MarshalPlan {
  const marks = trackMarks(doc);
  if (
    Math.abs(marks.lapLength - analysis.lapLength) > 1e-6 ||
    marks.jumps.length !== classes[0].analysis.jumps.length
  )
    throw new RangeError("analysis: was made from another layout than doc");
  const index = indexTrack(marks.line);
  const limits = Object.fromEntries(
    analysis.rules.checks.map((c) => [c.id, c.value]),
  ) as unknown as GuidanceValues;
  const windowOf = how.jumpWindow ?? ((p: JumpProfile) => ballisticJumpWindow(p));
  const zones = [
    ...jumpZones(marks, classes, settings, windowOf),
    ...turnZones(marks, analysis.line, classes, settings),
  ]
    .map((z) => ({ ...z, contents: zoneContents(z, marks, doc.marshalPoints, doc.siteBoundary) }))
    .sort((a, b) => a.s - b.s);
  const hotspots = findHotspots(analysis, marks, classes, limits, zones);
  const ctx: PointContext = {
    marks,
    index,
    zones,
    hotspots,
    settings,
    spotRules: { marks, index, zones, settings, boundary: doc.siteBoundary },
    jumpS: classes[0].analysis.jumps.map((j) => j.landing?.s ?? j.lip.s),
  };
  const summary = (m: { id: string; title: string; sectionId: string }, s: number) => ({
    id: m.id,
    title: m.title,
    sectionId: m.sectionId,
    s,
  });
  return {
    classIds: classes.map((c) => c.id),
    settings,
    jumps: marks.jumps.map((j, k) => summary(j, classes[0].analysis.jumps[k].lip.s)),
    corners: marks.corners.map((c) => summary({ ...c, sectionId: c.sectionIds[0] }, c.entryS)),
    zones,
    hotspots,
    points: pointReports(doc.marshalPoints, ctx),
    suggested: how.suggest ? suggestPlan(ctx, limits, marks.lapLength) : null,
    note: MARSHAL_NOTE,
  };
}

function suggestPlan(ctx: PointContext, limits: GuidanceValues, L: number): SuggestedPlan {
  const chosen = placeMarshals({
    spots: marshalSpots(ctx.spotRules),
    hotspots: ctx.hotspots,
    lapLength: L,
    count: ctx.settings.heatSize,
    maxGapRatio: limits.maxMarshalGapRatio,
    coverDistance: ctx.settings.coverDistance,
  });
  const points: MarshalPointReport[] = pointReports(chosen, ctx);
  const covered = new Set(points.flatMap((p) => p.watch.filter((w) => w.covered).map((w) => w.hotspotId)));
  let gap = 0;
  for (let k = 0; k < chosen.length; k++)
    gap = Math.max(
      gap,
      chosen.length === 1 ? L : lapAhead(chosen[k].s, chosen[(k + 1) % chosen.length].s, L),
    );
  return {
    asked: ctx.settings.heatSize,
    points,
    uncovered: ctx.hotspots.filter((h) => !covered.has(h.id)).map((h) => h.id),
    gapRatio: chosen.length ? gap / (L / chosen.length) : 0,
  };
}
