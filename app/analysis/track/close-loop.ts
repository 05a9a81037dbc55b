/**
 * "Close the loop": proposes new lengths, radii and angles so that the end of the last section
 * meets the start within the closure tolerance, keeping the design. See
 * docs/decisions/0509-close-the-loop-keeps-the-design.md (it replaces decision 0202).
 *
 * 1. The heading: only turn angles change it, so one turn (the cheapest whose new angle stays in
 *    range and, with snapping, on the angle grid) takes the whole heading error.
 * 2. The position: once the angles are fixed, the end moves exactly linearly with each straight's
 *    length (along its heading) and each turn's radius (along its chord per metre of radius). Every
 *    single value and pair of values that cancels the gap is solved, its new values snapped (both
 *    roundings tried), and the cheapest that closes within tolerance wins.
 * Jumps, run-outs and locked sections never change (close-loop-values.ts).
 */
import type { LayoutDocument, LayoutSection } from "../format/layout-document";
import { adjustableValues, type AdjustableField, type AdjustableValue } from "./close-loop-values";
import { closureError, resolveSections, startPose, type Closure, type ResolvedSection } from "./geometry";

export type { AdjustableField, AdjustableValue, Protection } from "./close-loop-values";
export { adjustableValues, sectionRoles } from "./close-loop-values";

/** A loop whose end is this close to its start counts as closed: gap m, heading deg. */
export const CLOSURE_TOLERANCE = { gap: 0.05, headingDeg: 0.5 } as const;

/** True when the gap and the heading error are both within CLOSURE_TOLERANCE. */
export function isLoopClosed(c: Pick<Closure, "gap" | "headingDeg">): boolean {
  return c.gap <= CLOSURE_TOLERANCE.gap && Math.abs(c.headingDeg) <= CLOSURE_TOLERANCE.headingDeg;
}

export interface CloseLoopOptions {
  /** Snapping step of new lengths and radii, m (0 or absent: no snapping). */
  lengthStep?: number;
  /** Snapping step of new angles, degrees (0 or absent: no snapping). */
  angleStep?: number;
}

export interface SectionChange {
  index: number;
  sectionId: string;
  field: AdjustableField;
  /** Old and new value: m for length and radius, degrees for angleDeg. */
  from: number;
  to: number;
}

export type CloseLoopResult<T> =
  | {
      ok: true;
      document: T;
      changes: SectionChange[];
      /** Closure of the proposed document. */
      closure: Closure;
      /** False when snapping left a gap larger than the tolerance (the closure says how much). */
      closed: boolean;
    }
  | { ok: false; reason: string; closure: Closure };

type Doc = Pick<LayoutDocument, "start" | "sections">;
type Change = { value: AdjustableValue; to: number };
interface Plan {
  changes: Change[];
  cost: number;
  /** Gap left, m. */
  residual: number;
}

/** Heading options tried, cheapest first; pairs of position values come from this many cheapest. */
const HEADING_OPTIONS = 16;
const POSITION_VALUES = 48;

/**
 * Proposes the change that closes the loop. The document is not changed; the result holds a new
 * one and the list of changes.
 */
export function closeLoop<T extends Doc>(doc: T, options: CloseLoopOptions = {}): CloseLoopResult<T> {
  const start = startPose(doc);
  const closure = closureError(resolveSections(doc), start);
  if (isLoopClosed(closure)) return { ok: true, document: doc, changes: [], closure, closed: true };
  const values = adjustableValues(doc.sections);
  if (values.length === 0)
    return fail(
      "every section is a jump, a jump's run-out to the next turn or locked: nothing may change",
      closure,
    );
  const headings = headingFixes(values, doc.sections, closure.headingDeg, options.angleStep ?? 0);
  if (headings.length === 0) {
    const grid = options.angleStep ? ` on the ${options.angleStep}° snapping grid` : "";
    return fail(
      `no turn that may change can take the heading error of ${Math.abs(closure.headingDeg).toFixed(1)}°${grid}; switch angle snapping off or change a turn by hand`,
      closure,
    );
  }
  let best: Plan | null = null;
  for (const h of headings) {
    const sections = apply(doc.sections, h.changes);
    const resolved = resolveSections({ start: doc.start, sections });
    const c = closureError(resolved, start);
    const movable = values.filter((v) => v.field !== "angleDeg");
    const p = positionFix(resolved, movable, c, options.lengthStep ?? 0);
    if (!p) continue;
    const plan = { changes: [...h.changes, ...p.changes], cost: h.cost + p.cost, residual: p.residual };
    if (better(plan, best)) best = plan;
  }
  if (!best)
    return fail(
      "no change of the straights and turns that may change closes the loop within their allowed ranges; reshape the layout by hand",
      closure,
    );
  const document = { ...doc, sections: apply(doc.sections, best.changes) };
  const after = closureError(resolveSections(document), start);
  const changes = best.changes
    .filter((c) => c.to !== c.value.value)
    .map((c) => ({
      index: c.value.index,
      sectionId: doc.sections[c.value.index].id,
      field: c.value.field,
      from: c.value.value,
      to: c.to,
    }))
    .sort((a, b) => a.index - b.index);
  return { ok: true, document, changes, closure: after, closed: isLoopClosed(after) };
}

function fail<T>(reason: string, closure: Closure): CloseLoopResult<T> {
  return { ok: false, reason, closure };
}

/** A plan that closes beats one that does not; then the cheaper, or the one leaving less gap. */
function better(a: Plan, b: Plan | null): boolean {
  if (!b) return true;
  const aCloses = a.residual <= CLOSURE_TOLERANCE.gap;
  const bCloses = b.residual <= CLOSURE_TOLERANCE.gap;
  if (aCloses !== bCloses) return aCloses;
  return aCloses ? a.cost < b.cost - 1e-12 : a.residual < b.residual - 1e-9;
}

function apply(sections: readonly LayoutSection[], changes: Change[]): LayoutSection[] {
  const out = sections.slice();
  for (const c of changes)
    out[c.value.index] = { ...out[c.value.index], [c.value.field]: c.to } as LayoutSection;
  return out;
}

/** Cleans binary noise off a value: 0.1 mm or 0.0001 degree. */
const clean = (x: number) => Math.round(x * 1e4) / 1e4;

function onGrid(x: number, step: number): boolean {
  return !(step > 0) || Math.abs(x / step - Math.round(x / step)) < 1e-7;
}

/** One turn taking the whole heading error, cheapest first (none needed when within tolerance). */
function headingFixes(
  values: AdjustableValue[],
  sections: readonly LayoutSection[],
  headingDeg: number,
  step: number,
): { changes: Change[]; cost: number }[] {
  if (Math.abs(headingDeg) <= CLOSURE_TOLERANCE.headingDeg) return [{ changes: [], cost: 0 }];
  const out: { changes: Change[]; cost: number }[] = [];
  for (const v of values) {
    if (v.field !== "angleDeg") continue;
    const s = sections[v.index] as Extract<LayoutSection, { kind: "turn" }>;
    const sign = s.direction === "left" ? 1 : -1;
    const options = [-360, 0, 360]
      .map((k) => clean(v.value - sign * headingDeg + k))
      .filter((to) => to >= v.limit.min && to <= v.limit.max && onGrid(to, step))
      .sort((a, b) => Math.abs(a - v.value) - Math.abs(b - v.value));
    if (options.length) {
      const to = options[0];
      out.push({ changes: [{ value: v, to }], cost: Math.abs(to - v.value) * v.unitCost });
    }
  }
  return out.sort((a, b) => a.cost - b.cost).slice(0, HEADING_OPTIONS);
}

/** How the end moves per unit of a length (along the straight) or a radius (along the chord), m/m. */
function direction(v: AdjustableValue, r: ResolvedSection): [number, number] {
  const h = r.start.heading;
  if (v.field === "length") return [Math.cos(h), Math.sin(h)];
  const sign = Math.sign(r.curvature);
  const h2 = r.end.heading;
  return [sign * (Math.sin(h2) - Math.sin(h)), sign * (Math.cos(h) - Math.cos(h2))];
}

/** The cheapest single value or pair of values (lengths, radii) that cancels the gap. */
function positionFix(
  resolved: ResolvedSection[],
  values: AdjustableValue[],
  c: Closure,
  step: number,
): Plan | null {
  if (c.gap <= CLOSURE_TOLERANCE.gap) return { changes: [], cost: 0, residual: c.gap };
  const g: [number, number] = [c.dx, c.dy];
  const cands = values
    .map((v) => ({ v, w: direction(v, resolved[v.index]) }))
    .filter((x) => Math.hypot(x.w[0], x.w[1]) > 1e-9)
    .sort((a, b) => a.v.unitCost - b.v.unitCost)
    .slice(0, POSITION_VALUES);
  let best: Plan | null = null;
  const consider = (picked: { v: AdjustableValue; w: [number, number] }[], deltas: number[]) => {
    const p = snapped(picked, deltas, g, step);
    if (p && better(p, best)) best = p;
  };
  for (let a = 0; a < cands.length; a++) {
    const A = cands[a];
    const ww = A.w[0] * A.w[0] + A.w[1] * A.w[1];
    const cross = A.w[0] * g[1] - A.w[1] * g[0];
    if (Math.abs(cross) <= 1e-9 * Math.sqrt(ww) * c.gap + 1e-12)
      consider([A], [-(A.w[0] * g[0] + A.w[1] * g[1]) / ww]);
    for (let b = a + 1; b < cands.length; b++) {
      const B = cands[b];
      const det = A.w[0] * B.w[1] - A.w[1] * B.w[0];
      if (Math.abs(det) < 1e-6) continue;
      // Solve dA wA + dB wB = -g by Cramer's rule.
      const dA = (-g[0] * B.w[1] + g[1] * B.w[0]) / det;
      const dB = (-A.w[0] * g[1] + A.w[1] * g[0]) / det;
      consider([A, B], [dA, dB]);
    }
  }
  return best;
}

/** The picked values moved by the deltas, snapped (each rounding tried), inside their ranges. */
function snapped(
  picked: { v: AdjustableValue; w: [number, number] }[],
  deltas: number[],
  g: [number, number],
  step: number,
): Plan | null {
  const options = picked.map(({ v }, k) => {
    const x = v.value + deltas[k];
    if (Math.abs(deltas[k]) < 1e-9) return [v.value];
    const raw = step > 0 ? [Math.floor(x / step) * step, Math.ceil(x / step) * step] : [x];
    return [...new Set(raw.map(clean))].filter((to) => to >= v.limit.min && to <= v.limit.max);
  });
  if (options.some((o) => o.length === 0)) return null;
  let best: Plan | null = null;
  const pick = (k: number, chosen: number[]) => {
    if (k === picked.length) {
      let rx = g[0];
      let ry = g[1];
      let cost = 0;
      const changes: Change[] = [];
      chosen.forEach((to, i) => {
        const { v, w } = picked[i];
        rx += (to - v.value) * w[0];
        ry += (to - v.value) * w[1];
        cost += Math.abs(to - v.value) * v.unitCost;
        changes.push({ value: v, to });
      });
      const plan = { changes, cost, residual: Math.hypot(rx, ry) };
      if (better(plan, best)) best = plan;
      return;
    }
    for (const to of options[k]) pick(k + 1, [...chosen, to]);
  };
  pick(0, []);
  return best;
}
