/**
 * Hotspots of the plan itself (docs/decisions/0701): lanes that pass close to each other (scored
 * by the gap between their edges) and stretches hidden from the driver stand (by their length).
 */
import type { LayoutAnalysis } from "../layout/layout-analysis-types";
import { pointAt } from "../verdict/jump-turn";
import type { HotspotDraft } from "./marshal-types";
import { placeOnLap, type TrackMarks } from "./track-marks";
import { num } from "./words";

export function laneHotspots(analysis: Omit<LayoutAnalysis, "risk">, marks: TrackMarks): HotspotDraft[] {
  return analysis.laneConflicts.map((c) => {
    const gap = c.distance - analysis.trackWidth;
    const b = pointOnLap(analysis, c.b);
    const here = `the track ${placeOnLap(marks, c.fromS)}`;
    const there = `the track ${placeOnLap(marks, b)}`;
    return {
      kind: "close-lanes",
      score: gap < 0 ? 5 : gap < 0.5 ? 3 : 2,
      reason:
        gap < 0
          ? `${cap(here)} runs into ${there}: cars from one lane meet cars on the other.`
          : `${cap(here)} and ${there} pass ${num(gap)} m apart edge to edge: a car that leaves one lane lands on the other.`,
      subject: null,
      s: c.fromS,
      fromS: c.fromS,
      toS: c.toS,
      x: (c.a[0] + c.b[0]) / 2,
      y: (c.a[1] + c.b[1]) / 2,
      classId: null,
      zoneId: null,
    };
  });
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** Lap distance of the analysis line's point nearest a plan point, m. */
function pointOnLap(analysis: Omit<LayoutAnalysis, "risk">, p: [number, number]): number {
  const { line } = analysis;
  let best = 0;
  let d2 = Infinity;
  for (let i = 0; i < line.x.length; i++) {
    const e = (line.x[i] - p[0]) ** 2 + (line.y[i] - p[1]) ** 2;
    if (e < d2) {
      d2 = e;
      best = i;
    }
  }
  return line.s[best];
}

export function hiddenHotspots(analysis: Omit<LayoutAnalysis, "risk">, marks: TrackMarks): HotspotDraft[] {
  return (analysis.hiddenFromStand ?? []).map((h) => {
    const L = marks.lapLength;
    const mid = (h.fromS + ((((h.toS - h.fromS) % L) + L) % L) / 2) % L;
    const p = pointAt(marks.line, mid);
    const blocker = marks.jumps.find((j) => j.sectionId === h.blockedBy);
    return {
      kind: "hidden",
      score: h.length < 2 ? 2 : h.length < 5 ? 3 : h.length < 10 ? 4 : 5,
      reason:
        `${num(h.length)} m of track ${placeOnLap(marks, mid)} is hidden from the driver stand` +
        `${blocker ? ` behind ${blocker.title}` : ""}: drivers cannot see a car that crashes there.`,
      subject: null,
      s: mid,
      fromS: h.fromS,
      toS: h.toS,
      x: p.x,
      y: p.y,
      classId: null,
      zoneId: null,
    };
  });
}
