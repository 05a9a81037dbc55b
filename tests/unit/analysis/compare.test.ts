import { describe, expect, it } from "vitest";
import { compareAnalyses, compareDocuments, type LayoutAnalysis } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

describe("compareDocuments", () => {
  it("matches sections by id: added, removed, changed with the fields that differ, the rest the same", () => {
    const b = {
      ...SUMMER_LAYOUT,
      name: "Summer layout, round 2",
      sections: [
        ...SUMMER_LAYOUT.sections
          .filter((s) => s.id !== "straight-3")
          .map((s) =>
            s.id === "straight-4" && s.kind === "straight" ? { ...s, length: 9, name: "Long one" } : s,
          ),
        { id: "extra", kind: "straight" as const, length: 2 },
      ],
    };
    const c = compareDocuments(SUMMER_LAYOUT, b);
    expect(c.counts).toEqual({ added: 1, removed: 1, changed: 1 });
    const changed = c.sections.find((s) => s.kind === "changed")!;
    expect(changed.sectionId).toBe("straight-4");
    expect(changed.fields).toEqual([
      { field: "length", from: 8, to: 9 },
      { field: "name", from: undefined, to: "Long one" },
    ]);
    expect(c.sections.find((s) => s.kind === "removed")).toMatchObject({
      sectionId: "straight-3",
      toIndex: null,
    });
    expect(c.sections.find((s) => s.kind === "added")).toMatchObject({ sectionId: "extra", fromIndex: null });
    expect(c.layout).toEqual([{ field: "name", from: "Summer layout", to: "Summer layout, round 2" }]);
    expect(compareDocuments(SUMMER_LAYOUT, SUMMER_LAYOUT).counts).toEqual({
      added: 0,
      removed: 0,
      changed: 0,
    });
  });
});

describe("compareAnalyses", () => {
  const jump = (
    sectionId: string,
    verdict: "set-up" | "straight",
    reason: string | null,
    takeoffSpeed: number,
  ) => {
    const v = { verdict, reason };
    return { sectionId, name: null, takeoffSpeed, airtime: 0.5, verdicts: { novice: v, club: v, expert: v } };
  };
  const analysis = (classes: unknown[]) => ({ classes }) as unknown as LayoutAnalysis;

  it("lists each class of either version with its lap time and each jump's verdict before and after", () => {
    const speed = { min: 2, max: 10, mean: 6 };
    const a = analysis([
      {
        classId: "x",
        label: "X",
        lapTime: 40,
        speed,
        jumps: [jump("j1", "straight", "no-turn", 6), jump("j2", "set-up", null, 7)],
      },
      { classId: "gone", label: "Gone", lapTime: 30, speed, jumps: [] },
    ]);
    const b = analysis([
      {
        classId: "x",
        label: "X",
        lapTime: 41.5,
        speed,
        jumps: [jump("j1", "straight", "cannot-clear", 5), jump("j3", "straight", "no-turn", 8)],
      },
    ]);
    const [x, gone] = compareAnalyses(a, b, "club");
    expect(x.lapTime).toEqual({ from: 40, to: 41.5 });
    expect(x.jumps.map((j) => [j.sectionId, j.from, j.to])).toEqual([
      ["j1", "straight", "cannot-clear"],
      ["j3", null, "straight"],
      ["j2", "set-up", null],
    ]);
    expect(x.jumps[0].takeoffSpeed).toEqual({ from: 6, to: 5 });
    expect(gone).toMatchObject({ classId: "gone", lapTime: { from: 30, to: null }, speed: { to: null } });
  });
});
