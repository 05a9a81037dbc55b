/**
 * Hotspots (issue 11, part 2): landings that are hard or have a narrow speed window, landings
 * into turns, overshoot zones that reach other track, marshals or the site's edge, fast turns
 * with little run-off, lanes close together and stretches hidden from the driver stand. Each has
 * a score from 1 to 5 and a reason in plain words (docs/decisions/0701 gives the scoring).
 */
import type { GuidanceValues } from "../track/rules";
import type { JumpAnalysis, LayoutAnalysis } from "../layout/layout-analysis-types";
import { landsForRules } from "../layout/jump-rules";
import type { Hotspot, HotspotDraft, MarshalZone } from "./marshal-types";
import type { TrackMarks } from "./track-marks";
import { hiddenHotspots, laneHotspots } from "./plan-hotspots";
import { num } from "./words";
import { zonePlaceWords, zoneScore } from "./zone-words";
import type { ZoneClass } from "./zones";
import { turnZoneHotspots } from "./turn-hotspots";

/**
 * Score of a measure against the club's limit, as the ratio (limit side / measured side, so that
 * 1 means exactly at the limit and more means past it): none under 0.75, then 1 to 5 at 0.75,
 * 1, 1.25, 1.5 and 2.
 */
export function ratioScore(ratio: number): number | null {
  if (!(ratio >= 0.75)) return null;
  if (ratio < 1) return 1;
  if (ratio < 1.25) return 2;
  if (ratio < 1.5) return 3;
  return ratio < 2 ? 4 : 5;
}

interface JumpRow {
  cls: ZoneClass;
  j: JumpAnalysis;
}

/** The row (class) where `value` is worst; null when no class has a value. */
function worstOf(rows: JumpRow[], value: (j: JumpAnalysis) => number | null, higherIsWorse: boolean) {
  let best: { row: JumpRow; x: number } | null = null;
  for (const row of rows) {
    const x = value(row.j);
    if (x === null || !Number.isFinite(x)) continue;
    if (!best || (higherIsWorse ? x > best.x : x < best.x)) best = { row, x };
  }
  return best;
}

function jumpHotspots(
  marks: TrackMarks,
  classes: readonly ZoneClass[],
  limits: GuidanceValues,
  zones: readonly MarshalZone[],
): HotspotDraft[] {
  const out: HotspotDraft[] = [];
  marks.jumps.forEach((mark, k) => {
    const rows = classes.map((cls) => ({ cls, j: cls.analysis.jumps[k] })).filter((r) => r.j);
    const landed = rows.filter((r) => landsForRules(r.j));
    const at = (r: JumpRow, kind: Hotspot["kind"], score: number, reason: string): HotspotDraft => {
      const l = r.j.landing;
      const s = l ? l.s : r.j.lip.s;
      return {
        kind,
        score,
        reason,
        subject: mark.id,
        s,
        fromS: r.j.lip.s,
        toS: s,
        x: l ? l.x : r.j.lip.x,
        y: l ? l.y : r.j.lip.y,
        classId: r.cls.id,
        zoneId: null,
      };
    };
    const who = (r: JumpRow) => (classes.length > 1 ? ` (${r.cls.car.label})` : "");

    const hard = worstOf(landed, (j) => j.equivalentFallHeight, true);
    const hardScore = hard && ratioScore(hard.x / limits.maxLandingFallHeight);
    if (hard && hardScore)
      out.push(
        at(
          hard.row,
          "hard-landing",
          hardScore,
          `${mark.title} lands hard: like a drop of ${num(hard.x)} m onto flat ground${who(hard.row)}; ` +
            `the track guidance allows ${num(limits.maxLandingFallHeight)} m.`,
        ),
      );

    const cased = rows.find((r) => r.j.cannotClear && r.j.flownOverBy === null && r.j.preset !== "whoops");
    const narrow = worstOf(
      landed.filter((r) => r.j.preset !== "whoops"),
      (j) => (j.window ? j.window.max - j.window.min : null),
      false,
    );
    const narrowScore = narrow && ratioScore(limits.minSpeedWindow / Math.max(1e-6, narrow.x));
    if (cased)
      out.push(
        at(
          cased,
          "narrow-window",
          3,
          `${mark.title} cannot be cleared from its approach${who(cased)}: cars case the landing and can cartwheel.`,
        ),
      );
    else if (narrow && narrowScore) {
      const w = narrow.row.j.window!;
      out.push(
        at(
          narrow.row,
          "narrow-window",
          narrowScore,
          `${mark.title} has a speed window of only ${w.max - w.min < 1 ? (w.max - w.min).toFixed(2) : num(w.max - w.min)} m/s ` +
            `(${num(w.min)} to ${num(w.max)} m/s${classes.length > 1 ? `, ${narrow.row.cls.car.label}` : ""}): ` +
            "a little slow cases the landing, a little fast overshoots it.",
        ),
      );
    }

    const into = worstOf(
      landed.filter((r) => r.j.turn !== null),
      (j) => j.turn!.distance,
      false,
    );
    if (into) {
      const turn = into.row.j.turn!;
      const corner = marks.corners.find((c) => c.sectionIds.includes(turn.sectionId));
      const angle = corner ? corner.angleDeg : turn.angleDeg;
      const base = angle < 45 ? 1 : angle < 90 ? 2 : angle < 150 ? 3 : 4;
      const short = into.x < limits.minLandingRunOut;
      const tries = rows.some((r) => r.j.plan !== null);
      out.push(
        at(
          into.row,
          "landing-into-turn",
          Math.min(5, base + (short ? 1 : 0)),
          `${mark.title} lands ${num(into.x)} m before ${corner ? corner.title : "a turn"}${who(into.row)}: ` +
            (tries
              ? "drivers who set the car up for it in the air roll over when they get it wrong"
              : "cars still settling from the landing roll over as they turn in") +
            (short
              ? `; less run-out than the ${num(limits.minLandingRunOut)} m the track guidance asks.`
              : "."),
        ),
      );
    }

    const zone = zones.find((z) => z.kind === "overshoot" && z.id === mark.id);
    if (zone) out.push(overshootHotspot(zone, rows[0]?.j ?? null));
  });
  return out;
}

function overshootHotspot(zone: MarshalZone, j: JumpAnalysis | null): HotspotDraft {
  const worst = zone.byClass.find((r) => r.classId === zone.classId)!;
  const h = (zone.wedge.headingDeg * Math.PI) / 180;
  const x = zone.wedge.x + zone.wedge.near * Math.cos(h);
  const y = zone.wedge.y + zone.wedge.near * Math.sin(h);
  return {
    kind: "overshoot",
    score: zoneScore(zone),
    reason:
      `Cars that overshoot ${zone.title} land ${zonePlaceWords(zone, "on the track", "on the flat")}, up to ${num(zone.wedge.far)} m past the lip ` +
      `(${worst.label} taking off at ${num(worst.speed)} m/s; the landing holds up to ${num(worst.limitSpeed)} m/s).`,
    subject: zone.id,
    s: j?.landing?.s ?? zone.s,
    fromS: zone.s,
    toS: j?.landing?.s ?? zone.s,
    x,
    y,
    classId: zone.classId,
    zoneId: zone.id,
  };
}

/** Every hotspot of a layout, in lap order, numbered H1, H2, .... */
export function findHotspots(
  analysis: Omit<LayoutAnalysis, "risk">,
  marks: TrackMarks,
  classes: readonly ZoneClass[],
  limits: GuidanceValues,
  zones: readonly MarshalZone[],
): Hotspot[] {
  const drafts = [
    ...jumpHotspots(marks, classes, limits, zones),
    ...turnZoneHotspots(zones),
    ...laneHotspots(analysis, marks),
    ...hiddenHotspots(analysis, marks),
  ];
  drafts.sort((a, b) => a.s - b.s || b.score - a.score);
  return drafts.map((d, i) => ({ id: `H${i + 1}`, ...d }));
}
