/**
 * Fast turns with little run-off: a corner whose run-off zone meets other track, a marshal point
 * or the site boundary before a car that missed its braking has stopped (docs/decisions/0701).
 */
import type { HotspotDraft, MarshalZone } from "./marshal-types";
import { zonePlaceWords } from "./zone-words";
import { num } from "./words";

/** Score of a speed: 1 under 6 m/s, then 2, 3, 4 and 5 from 6, 9, 12 and 15 m/s. */
export function speedScore(speed: number): number {
  return speed < 6 ? 1 : speed < 9 ? 2 : speed < 12 ? 3 : speed < 15 ? 4 : 5;
}

/** One hotspot per corner whose run-off is shorter than the distance to stop or holds a marshal point. */
export function turnZoneHotspots(zones: readonly MarshalZone[]): HotspotDraft[] {
  const out: HotspotDraft[] = [];
  for (const zone of zones) {
    if (zone.kind !== "run-off") continue;
    const c = zone.contents;
    const need = zone.wedge.far;
    const short = c.freeRunOff < need - 1e-6;
    if (!short && c.marshalPoints.length === 0) continue;
    const worst = zone.byClass.find((r) => r.classId === zone.classId)!;
    const score = Math.min(
      5,
      speedScore(worst.speed) + (c.freeRunOff < need / 2 ? 1 : 0) + (c.marshalPoints.length ? 1 : 0),
    );
    const room = short
      ? `, with ${c.freeRunOff.toFixed(1)} m of the ${need.toFixed(1)} m they need to stop`
      : "";
    const where = zonePlaceWords(zone, "across the track", "");
    out.push({
      kind: "fast-turn",
      score,
      reason:
        `Cars that miss their braking for ${zone.title} run straight on at up to ${num(worst.speed)} m/s ` +
        `${where ? `${where}` : "into the run-off"}${room} (${worst.label}; the turn holds ${num(worst.limitSpeed)} m/s).`,
      subject: zone.id,
      s: zone.s,
      fromS: zone.s,
      toS: zone.s,
      x: zone.wedge.x,
      y: zone.wedge.y,
      classId: zone.classId,
      zoneId: zone.id,
    });
  }
  return out;
}
