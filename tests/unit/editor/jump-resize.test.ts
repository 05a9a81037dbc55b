import { describe, expect, it } from "vitest";
import {
  defaultJump,
  jumpProfile,
  layoutGeometry,
  parseLayoutDocument,
  starterDocument,
  type JumpSection,
  type LayoutDocument,
  JUMP_PRESETS,
} from "~/analysis";
import { jumpMoveBlocker } from "~/lib/editor/drag-maths";
import { resizeJump } from "~/lib/editor/jump-resize";
import { asFreeProfile, changeSectionKind } from "~/lib/editor/section-ops";

/** The starter oval with a double in its back straight: straight 12, double, straight 12.4 (run-out). */
function withDouble(): LayoutDocument {
  const doc = starterDocument("Resize", 3);
  const double = defaultJump("double", "j1");
  const run = 30 - 12 - jumpProfile(double).length;
  doc.sections.splice(2, 1, { id: "s2", kind: "straight", length: 12 }, double, {
    id: "s3",
    kind: "straight",
    length: Math.round(run * 1e4) / 1e4,
  });
  return doc;
}

describe("a jump's new size keeps the loop closed", () => {
  it("takes the change from the straight before the jump, leaving the run-out and the closure as they were", () => {
    const doc = withDouble();
    expect(layoutGeometry(doc).closure.gap).toBeLessThan(1e-3);
    const bigger = { ...(doc.sections[3] as JumpSection), gap: 5.5 } as JumpSection;
    const out = resizeJump(doc, 3, bigger, "before");
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const grew = jumpProfile(bigger).length - jumpProfile(doc.sections[3] as JumpSection).length;
    expect(grew).toBeCloseTo(1.5, 6);
    expect((out.doc.sections[2] as { length: number }).length).toBeCloseTo(12 - grew, 4);
    expect(out.doc.sections[4]).toBe(doc.sections[4]);
    expect(layoutGeometry(out.doc).closure.gap).toBeLessThan(1e-3);
    expect(doc.sections[3]).not.toBe(bigger); // the old document is unchanged
  });

  it("can use the straight after instead, or nothing (the loop then opens)", () => {
    const doc = withDouble();
    const bigger = { ...(doc.sections[3] as JumpSection), gap: 5 } as JumpSection;
    const after = resizeJump(doc, 3, bigger, "after");
    expect(after.ok && after.doc.sections[2]).toBe(doc.sections[2]);
    if (after.ok) expect(layoutGeometry(after.doc).closure.gap).toBeLessThan(1e-3);
    const none = resizeJump(doc, 3, bigger, "none");
    expect(none.ok && layoutGeometry(none.doc).closure.gap).toBeCloseTo(1, 3);
  });

  it("refuses, saying why, when the chosen straight is locked, missing or would get too short", () => {
    const doc = withDouble();
    const bigger = { ...(doc.sections[3] as JumpSection), gap: 5 } as JumpSection;
    const locked = { ...doc, sections: doc.sections.map((s, i) => (i === 2 ? { ...s, locked: true } : s)) };
    expect(resizeJump(locked, 3, bigger, "before")).toEqual({
      ok: false,
      message: "cannot keep the loop closed: the straight before the jump is locked",
    });
    const short = { ...doc, sections: doc.sections.map((s, i) => (i === 2 ? { ...s, length: 1 } : s)) };
    const r = resizeJump(short as LayoutDocument, 3, bigger, "before");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/0.5 to 300 m/);
    const noStraight = starterDocument("x", 3);
    noStraight.sections.splice(2, 0, defaultJump("double", "j9"));
    expect(resizeJump(noStraight, 2, bigger, "before").ok).toBe(false);
  });

  it("does not move a jump whose neighbouring straight is locked", () => {
    const doc = withDouble();
    expect(jumpMoveBlocker(doc, 3)).toBeNull();
    const locked = { ...doc, sections: doc.sections.map((s, i) => (i === 4 ? { ...s, locked: true } : s)) };
    expect(jumpMoveBlocker(locked, 3)).toMatch(/locked/);
  });
});

describe("switching a preset jump to a free profile", () => {
  it("keeps the current shape's points, lip and landing, for every preset", () => {
    for (const preset of JUMP_PRESETS) {
      if (preset === "custom") continue;
      const jump = { ...defaultJump(preset, "j1"), name: "Back double", locked: true } as Exclude<
        JumpSection,
        { preset: "custom" }
      >;
      const free = asFreeProfile(jump);
      const before = jumpProfile(jump);
      const after = jumpProfile(free);
      expect(after.length).toBeCloseTo(before.length, 2);
      expect(after.d[after.lipIndex]).toBeCloseTo(before.d[before.lipIndex], 2);
      expect(after.h[after.lipIndex]).toBeCloseTo(before.h[before.lipIndex], 2);
      expect(after.sweetSpot).toBeCloseTo(before.sweetSpot, 2);
      expect(free).toMatchObject({ id: "j1", name: "Back double", locked: true, preset: "custom" });
      const doc = { ...starterDocument("x", 3), sections: [...starterDocument("x", 3).sections, free] };
      expect(parseLayoutDocument(doc)).toMatchObject({ ok: true });
    }
  });

  it("is what changing the shape to a free profile does in the editor", () => {
    const doc = withDouble();
    const next = changeSectionKind(doc, 3, "jump", "custom");
    expect(next.sections[3]).toEqual(asFreeProfile(doc.sections[3] as never));
    expect(layoutGeometry(next).closure.gap).toBeLessThan(5e-3);
  });
});
