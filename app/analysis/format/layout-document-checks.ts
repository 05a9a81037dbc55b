/**
 * Checks of a layout document that span several fields (ids unique, custom profiles well formed,
 * jump heights consistent). Part of the layout document schema (layout-document.ts).
 */
import type { CustomJumpSection, LayoutDocumentFields } from "./layout-document";

/** Slope of the back sides of takeoff and landing mounds in the generated jump profiles, degrees. */
export const MOUND_BACK_SLOPE_DEG = 40;

/**
 * Shortest gap (m) for which the lower crest of a generated jump is not buried under the back
 * side of the higher mound (twice as far for a triple, whose middle hump sits half way).
 */
export function minimumGap(
  preset: "double" | "triple" | "step-up" | "step-down",
  faceHeight: number,
  landingHeight: number,
): number {
  const run = Math.abs(faceHeight - landingHeight) / Math.tan((MOUND_BACK_SLOPE_DEG * Math.PI) / 180);
  return (preset === "triple" ? 2 : 1) * run + 0.1;
}

type RawPath = (string | number)[];
const EPS = 1e-6;

/** Checks that span several fields; run on a document whose fields are each valid. */
export function crossFieldIssues(doc: LayoutDocumentFields): { path: RawPath; message: string }[] {
  const out: { path: RawPath; message: string }[] = [];
  const seen = new Map<string, number>();
  doc.sections.forEach((s, i) => {
    const first = seen.get(s.id);
    if (first !== undefined)
      out.push({ path: ["sections", i, "id"], message: `repeats the id of sections[${first}]` });
    else seen.set(s.id, i);
    if (s.kind !== "jump") return;
    const at = (field: string): RawPath => ["sections", i, field];
    if (s.preset === "step-up" && s.landingHeight <= s.faceHeight)
      out.push({ path: at("landingHeight"), message: "must be higher than faceHeight for a step-up" });
    if (s.preset === "step-down" && s.landingHeight >= s.faceHeight)
      out.push({ path: at("landingHeight"), message: "must be lower than faceHeight for a step-down" });
    if (s.preset === "triple" && s.gap < 3)
      out.push({ path: at("gap"), message: "must be at least 3 m for a triple" });
    if (
      s.preset === "double" ||
      s.preset === "triple" ||
      s.preset === "step-up" ||
      s.preset === "step-down"
    ) {
      const need = minimumGap(s.preset, s.faceHeight, s.landingHeight);
      if (s.gap < need)
        out.push({ path: at("gap"), message: `must be at least ${need.toFixed(2)} m for these heights` });
    }
    if (s.preset === "custom") out.push(...customProfileIssues(s, i));
  });
  const classes = new Set<string>();
  doc.carClasses.forEach((c, i) => {
    if (classes.has(c)) out.push({ path: ["carClasses", i], message: `repeats "${c}"` });
    classes.add(c);
  });
  return out;
}

function customProfileIssues(s: CustomJumpSection, i: number): { path: RawPath; message: string }[] {
  const out: { path: RawPath; message: string }[] = [];
  const p = s.profile;
  const last = p.length - 1;
  if (Math.abs(p[0][0]) > EPS)
    out.push({
      path: ["sections", i, "profile", 0, 0],
      message: "must be 0 (the profile starts at the section start)",
    });
  if (Math.abs(p[0][1]) > EPS)
    out.push({
      path: ["sections", i, "profile", 0, 1],
      message: "must be 0 (the profile starts at ground level)",
    });
  if (Math.abs(p[last][1]) > EPS)
    out.push({
      path: ["sections", i, "profile", last, 1],
      message: "must be 0 (the profile ends at ground level)",
    });
  for (let k = 1; k <= last; k++) {
    if (p[k][0] <= p[k - 1][0] + EPS) {
      out.push({
        path: ["sections", i, "profile", k, 0],
        message: "must be greater than the distance of the point before",
      });
      break;
    }
  }
  if (s.lipIndex >= last)
    out.push({
      path: ["sections", i, "lipIndex"],
      message: `must be less than ${last} (the last profile index)`,
    });
  if (s.landingStartIndex <= s.lipIndex)
    out.push({ path: ["sections", i, "landingStartIndex"], message: "must be greater than lipIndex" });
  if (s.landingEndIndex <= s.landingStartIndex)
    out.push({ path: ["sections", i, "landingEndIndex"], message: "must be greater than landingStartIndex" });
  if (s.landingEndIndex > last)
    out.push({
      path: ["sections", i, "landingEndIndex"],
      message: `must be at most ${last} (the last profile index)`,
    });
  return out;
}

/**
 * Custom jumps the flight model cannot fly: where the ground just after the lip rises more steeply
 * than the face before it, a car launched along the face would be inside the ground at once
 * (flight.ts refuses such a takeoff). Kept out of the schema so stored documents still load; the
 * server runs it before saving, importing or analysing. Paths are the document's own fields.
 * @returns one issue per such jump, naming its `lipIndex`.
 */
export function takeoffIssues(
  doc: Pick<LayoutDocumentFields, "sections">,
): { path: string; message: string }[] {
  const out: { path: string; message: string }[] = [];
  doc.sections.forEach((s, i) => {
    if (s.kind !== "jump" || s.preset !== "custom") return;
    const p = s.profile;
    const k = s.lipIndex;
    if (k < 1 || k + 1 >= p.length) return; // the schema's own checks report these
    const face = (p[k][1] - p[k - 1][1]) / (p[k][0] - p[k - 1][0]);
    const after = (p[k + 1][1] - p[k][1]) / (p[k + 1][0] - p[k][0]);
    if (after > face + 1e-9)
      out.push({
        path: `sections[${i}].lipIndex`,
        message: `is not a takeoff: the ground after profile point ${k} rises more steeply than the face before it, so no car can leave the ground there (put the lip at the top of the face)`,
      });
  });
  return out;
}
