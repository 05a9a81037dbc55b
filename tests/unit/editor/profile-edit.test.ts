import { describe, expect, it } from "vitest";
import { jumpProfile, type CustomJumpSection, type JumpSection, defaultJump } from "~/analysis";
import {
  addProfilePoint,
  dragProfileHandle,
  profileHandles,
  removeProfilePoint,
} from "~/lib/editor/profile-edit";
import { checkSectionPatch, sectionIssues } from "~/lib/editor/field-check";

const SNAP = { lengths: true, angles: true };
const FREE = { lengths: false, angles: false };

describe("side-view handles sit on the generated profile", () => {
  it("puts the lip handle on the profile's lip for every preset with a lip", () => {
    for (const preset of ["tabletop", "double", "triple", "step-up", "step-down"] as const) {
      const jump = defaultJump(preset, "j");
      const p = jumpProfile(jump);
      const lip = profileHandles(jump).find((h) => h.id === "lip")!;
      expect(lip.d, preset).toBeCloseTo(p.d[p.lipIndex], 9);
      expect(lip.h, preset).toBeCloseTo(p.h[p.lipIndex], 9);
    }
  });

  it("ends a tabletop's foot handle where its profile ends", () => {
    const jump = defaultJump("tabletop", "j");
    const foot = profileHandles(jump).find((h) => h.id === "foot")!;
    expect(foot.d).toBeCloseTo(jumpProfile(jump).length, 9);
  });
});

describe("dragging side-view handles", () => {
  it("sets a lip's height and face angle from where it is dragged", () => {
    const jump = defaultJump("tabletop", "j") as Extract<JumpSection, { preset: "tabletop" }>;
    // a lip 0.6 m high 0.6 m along: a 45 degree face
    const out = dragProfileHandle(jump, "lip", 0.6, 0.6, FREE) as typeof jump;
    expect(out.faceHeight).toBeCloseTo(0.6, 9);
    expect(out.faceAngleDeg).toBeCloseTo(45, 9);
    const snapped = dragProfileHandle(jump, "lip", 0.61, 0.437, SNAP) as typeof jump;
    expect(snapped.faceHeight).toBe(0.45);
    expect(snapped.faceAngleDeg % 5).toBe(0);
  });

  it("sets a double's gap and landing height from its crest handle", () => {
    const jump = defaultJump("double", "j") as Extract<JumpSection, { preset: "double" }>;
    const lip = profileHandles(jump)[0];
    const out = dragProfileHandle(jump, "crest", lip.d + 5.04, 0.52, SNAP) as typeof jump;
    expect(out.gap).toBe(5);
    expect(out.landingHeight).toBe(0.5);
  });

  it("refuses a move that breaks a rule spanning fields: a step-up lower than its takeoff", () => {
    const jump = defaultJump("step-up", "j");
    const lip = profileHandles(jump)[0];
    expect(dragProfileHandle(jump, "crest", lip.d + 3, 0.2, SNAP)).toBe(jump);
  });

  it("moves a free profile's point between its neighbours and keeps the last point on the ground", () => {
    const jump = defaultJump("custom", "j") as CustomJumpSection;
    const out = dragProfileHandle(jump, "p2", 9, 0.3, SNAP) as CustomJumpSection;
    expect(out.profile[2]).toEqual([3.35, 0.3]); // stopped 0.05 m short of the next point (3.4 m)
    const last = dragProfileHandle(jump, "p4", 5.5, 1, SNAP) as CustomJumpSection;
    expect(last.profile[4]).toEqual([5.5, 0]);
    expect(sectionIssues(out)).toEqual([]);
  });

  it("adds and removes free-profile points, keeping the lip and landing on the same points", () => {
    const jump = defaultJump("custom", "j") as CustomJumpSection;
    const more = addProfilePoint(jump, 1);
    expect(more.profile).toHaveLength(6);
    expect(more.profile[2]).toEqual([1.9, 0.225]);
    expect(more.profile[more.lipIndex]).toEqual(jump.profile[jump.lipIndex]);
    expect(more.profile[more.landingStartIndex]).toEqual(jump.profile[jump.landingStartIndex]);
    const back = removeProfilePoint(more, 2);
    expect(back).toEqual(jump);
    // the lip cannot be removed
    expect(removeProfilePoint(jump, jump.lipIndex)).toBe(jump);
  });
});

describe("checking a section patch like the file format does", () => {
  it("names the field and the unit of a value out of range", () => {
    const doc = {
      sections: [
        { id: "t1", kind: "turn", radius: 8, angleDeg: 90, direction: "left" } as const,
        { id: "s1", kind: "straight", length: 5 } as const,
      ],
    };
    const bad = checkSectionPatch(doc, 0, { radius: 0.2 });
    expect(bad).toEqual({ ok: false, issues: [{ field: "radius", message: "must be at least 1 m" }] });
    const taken = checkSectionPatch(doc, 0, { id: "s1" });
    expect(taken.ok).toBe(false);
    expect(!taken.ok && taken.issues[0]).toEqual({
      field: "id",
      message: "is already used by another section",
    });
    expect(checkSectionPatch(doc, 0, { radius: 12 })).toMatchObject({ ok: true, section: { radius: 12 } });
  });
});
