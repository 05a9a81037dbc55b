/**
 * Everything measured on a layout's plan in one call: geometry, lane conflicts, the site
 * boundary, the driver stand's view and the marshal spread, and the rule checks built on them.
 */
import type { LayoutDocument } from "../format/layout-document";
import { layoutGeometry, trackEdges, type LayoutGeometry, type TrackEdges } from "./geometry";
import {
  DEFAULT_LANE_MARGIN,
  farthestFromStand,
  findLaneConflicts,
  findOutsideBoundary,
  marshalSpread,
  startStraight,
  type LaneConflict,
  type MarshalSpread,
  type OutsideStretch,
} from "./geometry-checks";
import { checkRules, type GuidanceOverrides, type RuleMeasurements, type RuleReport } from "./rules";
import { findHiddenFromStand, type HiddenStretch } from "./sight";

export interface MeasureOptions {
  /** Largest centre-line sample spacing, m (default 0.1). */
  spacing?: number;
  /** Extra room required between lanes beyond the track width, m. */
  laneMargin?: number;
  /** Height of a car's top for the line of sight, m. */
  carHeight?: number;
}

export interface LayoutMeasures {
  geometry: LayoutGeometry;
  edges: TrackEdges;
  laneConflicts: LaneConflict[];
  /** Null when the layout has no site boundary. */
  outsideBoundary: OutsideStretch[] | null;
  /** Null when the layout has no driver stand. */
  farthestFromStand: { distance: number; s: number; x: number; y: number } | null;
  hiddenFromStand: HiddenStretch[] | null;
  /** Total hidden length, m; null without a driver stand. */
  hiddenLength: number | null;
  startStraight: { length: number; sectionIds: string[] };
  marshals: MarshalSpread;
}

/** Measures a layout's plan (no car needed). */
export function measureLayout(doc: LayoutDocument, options: MeasureOptions = {}): LayoutMeasures {
  const geometry = layoutGeometry(doc, options.spacing ?? 0.1);
  const { line, sections } = geometry;
  const edges = trackEdges(line, doc.trackWidth);
  const stand = doc.driverStand;
  const hidden = stand
    ? findHiddenFromStand(line, sections, doc.trackWidth, stand, { carHeight: options.carHeight })
    : null;
  return {
    geometry,
    edges,
    laneConflicts: findLaneConflicts(line, doc.trackWidth, options.laneMargin ?? DEFAULT_LANE_MARGIN),
    outsideBoundary: doc.siteBoundary ? findOutsideBoundary(line, edges, doc.siteBoundary) : null,
    farthestFromStand: stand ? farthestFromStand(line, edges, stand) : null,
    hiddenFromStand: hidden,
    hiddenLength: hidden ? hidden.reduce((sum, h) => sum + h.length, 0) : null,
    startStraight: startStraight(sections),
    marshals: marshalSpread(line, doc.marshalPoints),
  };
}

/** The measurements the rule checks compare. */
export function ruleMeasurements(doc: LayoutDocument, m: LayoutMeasures): RuleMeasurements {
  return {
    trackWidth: doc.trackWidth,
    lapLength: m.geometry.lapLength,
    standDistance: m.farthestFromStand?.distance ?? null,
    startStraight: m.startStraight.length,
    hiddenLength: m.hiddenLength,
    marshalGapRatio: m.marshals.ratio,
  };
}

/** Rule checks of a layout against its chosen guidance set, with a club's overrides. */
export function layoutRuleReport(
  doc: LayoutDocument,
  m: LayoutMeasures,
  overrides: GuidanceOverrides = {},
): RuleReport {
  return checkRules(ruleMeasurements(doc, m), doc.guidance, overrides);
}
