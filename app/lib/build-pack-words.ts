/**
 * Words of the build pack, defined once for the page, the PDFs and the CSV: what each stake is,
 * the bearing and offset conventions, and the building cautions.
 */
import type { StakeKind } from "~/analysis";

export const BUILD_PACK_TITLE = "Build pack";
export const MARKING_TITLE = "Marking-out sheet";
export const EARTHWORKS_TITLE = "Earthworks sheet";

export const STAKE_KIND_LABELS: Record<StakeKind, string> = {
  datum: "Datum stake",
  centre: "Centre line",
  "left-edge": "Left edge",
  "right-edge": "Right edge",
  "turn-centre": "Turn centre",
  "jump-toe": "Toe",
  "jump-lip": "Lip",
  "jump-crest": "Crest",
  "jump-landing-end": "Landing end",
  "jump-foot": "Foot",
  "jump-mound-foot": "Mound foot",
  "jump-slope-change": "Change of slope",
  "jump-bump-crest": "Bump crest",
};

/** Names of the datum choices (site points of the layout, or typed coordinates). */
export const DATUM_CHOICE_LABELS = {
  start: "Start of the lap (centre line)",
  stand: "Driver stand",
  corner: "Site boundary corner",
  marshal: "Marshal point",
  xy: "Plan coordinates",
} as const;

export const BEARING_CONVENTION =
  "Bearings are degrees clockwise from grid north: straight up the plan (its +y direction), 0 to 360. They are not compass bearings unless the plan's up is north on the ground.";

export const OFFSET_CONVENTION =
  "Along: metres from A on the line from A to B (negative behind A). Offset: metres square to that line, positive to the right looking from A to B, negative to the left.";

export const HEIGHT_CONVENTION =
  "Heights are above the surrounding ground at the stake, in metres, assuming the site is level.";

/** How to use the datums, with the A-to-B bearing filled in. */
export function markingMethod(abBearing: string, abLength: string): string[] {
  return [
    `Drive a stake at datum A and at datum B where the plan shows them. They are ${abLength} m apart; B lies at ${abBearing}° from A.`,
    `With a total station or theodolite: set up over A, sight B and set the horizontal angle to ${abBearing}°; each stake is then at its bearing and distance from A.`,
    "With tapes: stretch a string line from A through B, measure the along distance from A on it, then the offset square to it.",
  ];
}

export const EARTH_MODEL =
  "Each jump's long section (its profile as drawn) is flat across the track width; beyond each track edge the earth falls to the ground at the mounds' back-side angle. Volume = width × area of the long section + the two side slopes. Earth above the surrounding ground is fill, below it (a dip in a free profile) is cut.";

/** Cautions printed on every sheet of the build pack. */
export const BUILDING_CAUTIONS = [
  "Earth volumes are estimates from the drawing. The ground's real level, the soil, its moisture and how hard it is compacted all change how much earth a jump takes: order extra and ask your supplier.",
  "Building work follows local codes, permits and safe practice: locate buried cables and pipes before digging, keep people clear of working machines and tipping trucks, and use competent operators.",
  "Check every stake against a second measurement (distance from A and the offset from the line) before building, and check the finished shapes against the layout before anyone drives.",
  "Loftline's figures are an estimate, not an engineering design or a safety certification. The club's sanctioning body's current rulebook, local regulations and the site's own risk assessment decide.",
] as const;

export const TURNS_CAPTION = "Turns: set out from the centre";
export const JUMPS_CAPTION = "Jumps: toe, lip, crest and landing end";
export const EARTH_CAPTION = "Earth in each jump";
export const LOADS_NOTE =
  "Loads are whole trucks rounded up; the total's loads are counted on the total volume, so they can be fewer than the jumps' loads added up.";

export function stationsCaption(spacing: string): string {
  return `Centre line and edges: a station every ${spacing} m and at every section end`;
}

export function closureWarning(gap: string): string {
  return `The loop does not close: its end misses its start by ${gap} m. Close it in the editor before marking out.`;
}
