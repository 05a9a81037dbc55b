/**
 * The marshal risk's words, defined once: what each kind of hotspot, score and zone is called
 * on the pages, the sheet and the PDF, and the caveat shown with every plan.
 */
import type { HotspotKind, MarshalWarning, MarshalZone } from "./marshal-types";

export const HOTSPOT_KIND_WORDS: Record<HotspotKind, string> = {
  "hard-landing": "Hard landing",
  "narrow-window": "Narrow speed window",
  "landing-into-turn": "Landing into a turn",
  overshoot: "Overshoot beyond a landing",
  "fast-turn": "Fast turn with little run-off",
  "close-lanes": "Lanes close together",
  hidden: "Hidden from the driver stand",
};

/** What each score means, 1 to 5 (index 0 is score 1). */
export const HOTSPOT_SCORE_WORDS = [
  "keep an eye on it",
  "take care",
  "dangerous",
  "very dangerous",
  "most dangerous",
] as const;

/** The words for a score from 1 to 5. */
export function scoreWords(score: number): string {
  return HOTSPOT_SCORE_WORDS[Math.min(5, Math.max(1, Math.round(score))) - 1];
}

export const ZONE_KIND_WORDS: Record<MarshalZone["kind"], string> = {
  overshoot: "overshoot zone",
  "run-off": "run-off zone",
};

export const WARNING_KIND_WORDS: Record<MarshalWarning["kind"], string> = {
  "in-zone": "Inside a zone",
  "on-track": "On the track",
  "too-far": "Too far from the track",
};

/** Shown with every marshal plan. */
export const MARSHAL_NOTE =
  "Zones, hotspots and marshal points are model estimates from the drawing and the car class data, not measurements " +
  "and not a safety certification. Cars can go farther than any zone shows. Stand out of the overshoot zone beyond " +
  "landings and the outside of fast turns, stay low and face the traffic. The sanctioning body's current rulebook, " +
  "local regulations and the site's own risk assessment decide.";

/** A length or speed in words: one decimal under 10, whole numbers from 10. */
export function num(x: number): string {
  return Math.abs(x) >= 10 ? x.toFixed(0) : x.toFixed(1).replace(/\.0$/, "");
}

/** "A, B and C". */
export function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
