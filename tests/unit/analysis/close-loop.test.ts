/**
 * "Close the loop" keeps the design: jumps, run-outs and locked sections never change, snapping
 * is honoured, the longest straight away from jumps is preferred, and the loops the earlier
 * method closed still close. Geometry is exact (arcs and straights): common practice, no source.
 */
import { describe, expect, it } from "vitest";
import type { LayoutDocument, LayoutSection } from "~/analysis/format/layout-document";
import { defaultJump } from "~/analysis/format/jump-presets";
import { CLOSURE_TOLERANCE, closeLoop, isLoopClosed, sectionRoles } from "~/analysis/track/close-loop";
import { layoutGeometry } from "~/analysis/track/geometry";

type Loop = Pick<LayoutDocument, "start" | "sections">;
const SNAP = { lengthStep: 0.1, angleStep: 5 };

const straight = (id: string, length: number): LayoutSection => ({ id, kind: "straight", length });
const left = (id: string, radius: number, angleDeg: number): LayoutSection => ({
  id,
  kind: "turn",
  radius,
  angleDeg,
  direction: "left",
});

function loop(...sections: LayoutSection[]): Loop {
  return { start: { x: 0, y: 0, headingDeg: 0 }, sections };
}

/** The layout of the issue: straight, hairpin, straight, double, 1 m straight, hairpin. */
function issueLayout(): Loop {
  return loop(
    straight("s1", 30),
    left("t1", 8, 180),
    straight("s2", 30),
    defaultJump("double", "j1"),
    straight("s3", 1),
    left("t2", 8, 180),
  );
}

const onGrid = (x: number, step: number) => Math.abs(x / step - Math.round(x / step)) < 1e-7;

describe("close the loop", () => {
  it("counts a gap within a few centimetres and a fraction of a degree as closed", () => {
    expect(CLOSURE_TOLERANCE.gap).toBeLessThanOrEqual(0.05);
    expect(CLOSURE_TOLERANCE.headingDeg).toBeLessThan(1);
    expect(isLoopClosed({ gap: 0.01, headingDeg: 0.1 })).toBe(true);
    expect(isLoopClosed({ gap: 0.06, headingDeg: 0 })).toBe(false);
    expect(isLoopClosed({ gap: 0, headingDeg: 0.6 })).toBe(false);
    const r = closeLoop(loop(straight("a", 30.01), left("b", 8, 180), straight("c", 30), left("d", 8, 180)));
    expect(r.ok && r.changes).toEqual([]);
  });

  it("keeps the jump, its run-out and the hairpins, and stretches the long straight on the snapping grid", () => {
    const doc = issueLayout();
    const r = closeLoop(doc, SNAP);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.closed).toBe(true);
    expect(isLoopClosed(layoutGeometry(r.document).closure)).toBe(true);
    expect(r.document.sections[3]).toBe(doc.sections[3]); // the double
    expect(r.document.sections[4]).toEqual(straight("s3", 1)); // its run-out into the hairpin
    expect(r.document.sections[1]).toEqual(left("t1", 8, 180));
    expect(r.document.sections[5]).toEqual(left("t2", 8, 180));
    // the start straight, the longest one away from the jump, takes it all
    expect(r.changes.map((c) => c.sectionId)).toEqual(["s1"]);
    for (const c of r.changes) expect(onGrid(c.to, 0.1)).toBe(true);
  });

  it("never changes a locked section", () => {
    const doc = issueLayout();
    doc.sections[0] = { ...doc.sections[0], locked: true };
    const r = closeLoop(doc, SNAP);
    expect(r.ok && r.closed).toBe(true);
    if (!r.ok) return;
    expect(r.document.sections[0]).toBe(doc.sections[0]);
    expect(r.changes.every((c) => c.sectionId !== "s1")).toBe(true);
    expect(isLoopClosed(r.closure)).toBe(true);
  });

  it("treats the straights from a landing round the lap to the next turn as the run-out", () => {
    // the jump is the last section: its run-out wraps round to the start straight
    const doc = loop(
      straight("s1", 6),
      left("t1", 8, 180),
      straight("s2", 40),
      left("t2", 8, 180),
      straight("s3", 20),
      defaultJump("tabletop", "j1"),
    );
    const roles = sectionRoles(doc.sections);
    expect(roles.protection).toEqual(["run-out", null, null, null, null, "jump"]);
    expect(roles.approach[4]).toBe(true);
    expect(roles.landingTurn[1]).toBe(true);
    const r = closeLoop(doc, SNAP);
    expect(r.ok && r.closed).toBe(true);
    if (!r.ok) return;
    expect(r.document.sections[0]).toBe(doc.sections[0]);
    expect(r.document.sections[5]).toBe(doc.sections[5]);
  });

  it("prefers a straight away from the jump to the jump's approach", () => {
    // 40 m back straight and a 40 m approach: the back straight, weighted lighter, changes
    const doc = loop(
      straight("s1", 40),
      defaultJump("tabletop", "j1"),
      straight("s2", 3),
      left("t1", 8, 180),
      straight("s3", 48),
      left("t2", 8, 180),
    );
    const r = closeLoop(doc, SNAP);
    expect(r.ok && r.closed).toBe(true);
    if (!r.ok) return;
    expect(r.changes.map((c) => c.sectionId)).toEqual(["s3"]);
  });

  it("closes a heading error with one turn whose new angle stays on the 5 degree grid", () => {
    const doc = loop(straight("a", 30), left("b", 8, 180), straight("c", 28.7), left("d", 8, 176));
    doc.sections.push(straight("e", 2));
    const r = closeLoop(doc, SNAP);
    expect(r.ok && r.closed).toBe(true);
    if (!r.ok) return;
    for (const c of r.changes) expect(onGrid(c.to, c.field === "angleDeg" ? 5 : 0.1)).toBe(true);
    expect(r.changes.find((c) => c.field === "angleDeg")).toMatchObject({ sectionId: "d", to: 180 });
  });

  it("says so when snapping leaves no turn that can take the heading error", () => {
    const doc = loop(straight("a", 30), left("b", 8, 182), straight("c", 30), left("d", 8, 179));
    const r = closeLoop(doc, SNAP);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reason).toMatch(/snapping/);
    // without snapping it closes exactly
    const free = closeLoop(doc);
    expect(free.ok && free.closed).toBe(true);
    if (free.ok) expect(free.closure.gap).toBeLessThan(1e-3);
  });

  it("closes the loops the earlier method closed (a heading and a gap among the last sections)", () => {
    const open = loop(straight("a", 30), left("b", 8, 180), straight("c", 28.7), left("d", 8, 176));
    open.sections.push(straight("e", 2));
    expect(layoutGeometry(open).closure.gap).toBeGreaterThan(1);
    const r = closeLoop(open);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const after = layoutGeometry(r.document).closure;
    expect(after.gap).toBeLessThan(1e-3);
    expect(Math.abs(after.headingDeg)).toBeLessThan(1e-3);
    r.document.sections.forEach((s, i) => {
      if (!r.changes.some((c) => c.index === i)) expect(s).toBe(open.sections[i]);
    });
  });

  it("closes perturbed loops of straights and turns, with and without snapping", () => {
    // a rectangle of four straights and four quarter turns, each value nudged by a seeded random
    let seed = 7;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 - 1;
    for (let k = 0; k < 20; k++) {
      const sections: LayoutSection[] = [];
      for (let side = 0; side < 4; side++) {
        sections.push(straight(`s${side}`, Number((20 + 10 * (side % 2) + 3 * rand()).toFixed(1))));
        sections.push(left(`t${side}`, Number((6 + rand()).toFixed(1)), side === 3 ? 85 : 90));
      }
      const doc = loop(...sections);
      for (const options of [{}, SNAP]) {
        const r = closeLoop(doc, options);
        expect(r.ok && r.closed, JSON.stringify(r.ok ? r.closure : r.reason)).toBe(true);
        if (r.ok) expect(isLoopClosed(layoutGeometry(r.document).closure)).toBe(true);
      }
    }
  });

  it("says so when nothing may change", () => {
    const doc = loop(
      { ...straight("a", 40), locked: true },
      { ...left("b", 8, 180), locked: true },
      defaultJump("whoops", "j"),
    );
    const r = closeLoop(doc);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reason).toMatch(/nothing may change/);
    expect(r.closure.gap).toBeGreaterThan(1);
  });
});
