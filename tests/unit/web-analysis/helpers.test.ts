import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { analyseLayout } from "~/analysis";
import { flightCurve, ticks } from "~/components/analysis/elevation-path";
import { parseJumpSort, sortJumps } from "~/components/analysis/jump-sort";
import { speedLabels } from "~/components/drawing/drawing-geometry";
import { exportFileName } from "~/lib/layout-file-name";

describe("jumps table sorting", () => {
  const jumps = analyseLayout(SUMMER_LAYOUT, { classIds: ["buggy-2wd-10"] }).classes[0].jumps;

  it("sorts by airtime both ways and keeps track order for ties", () => {
    const up = sortJumps(jumps, { key: "airtime", dir: "asc" }, "club").map((j) => j.airtime);
    expect(up).toEqual([...up].sort((a, b) => a - b));
    const down = sortJumps(jumps, { key: "airtime", dir: "desc" }, "club").map((j) => j.airtime);
    expect(down).toEqual([...up].reverse());
    expect(sortJumps(jumps, { key: "order", dir: "asc" }, "club").map((j) => j.sectionId)).toEqual(
      jumps.map((j) => j.sectionId),
    );
  });

  it("names a parameter it does not understand and falls back", () => {
    expect(parseJumpSort(new URLSearchParams("sort=colour"))).toMatchObject({
      key: "order",
      problem: expect.stringMatching(/^sort:/),
    });
    expect(parseJumpSort(new URLSearchParams("sort=efh&dir=up"))).toMatchObject({
      key: "efh",
      dir: "asc",
      problem: expect.stringMatching(/^dir:/),
    });
    expect(parseJumpSort(new URLSearchParams("sort=gain&dir=desc"))).toEqual({
      key: "gain",
      dir: "desc",
      problem: null,
    });
  });
});

describe("plan and elevation drawing helpers", () => {
  it("labels the corners' slowest and the straights' fastest speeds, always the lap's extremes", () => {
    // Two corners (minima 3 and 4) and two straights (maxima 10 and 9) around a closed lap.
    const speed = [3, 5, 8, 10, 8, 5, 4, 6, 9, 7, 5];
    const labels = speedLabels(speed, 1, 2);
    expect(labels.map((l) => [l.kind, l.speed])).toEqual([
      ["min", 3],
      ["max", 10],
      ["min", 4],
      ["max", 9],
    ]);
  });

  it("draws the flight through the lip, the apex and the touchdown, level at the apex", () => {
    const lip = { d: 0.6, z: 0.35 };
    const apex = { d: 2.4, z: 0.88 };
    const landing = { d: 4.4, z: 0.24 };
    const pts = flightCurve(lip, apex, landing);
    expect(pts[0][0]).toBeCloseTo(lip.d, 9);
    expect(pts[0][1]).toBeCloseTo(lip.z, 9);
    expect(pts[pts.length - 1][0]).toBeCloseTo(landing.d, 9);
    expect(pts[pts.length - 1][1]).toBeCloseTo(landing.z, 9);
    expect(Math.max(...pts.map((p) => p[1]))).toBeCloseTo(apex.z, 9);
    expect(flightCurve(lip, apex, null)).toEqual([]);
  });

  it("puts ticks at round steps", () => {
    expect(ticks(-0.5, 6.5, 8)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(ticks(0, 0.69, 6)).toEqual([0, 0.2, 0.4, 0.6]);
  });

  it("makes a safe export file name", () => {
    expect(exportFileName("Summer layout", 3)).toBe("summer-layout-v3.loftline.json");
    expect(exportFileName('Ängelholm "Wet" / Night', 1)).toBe("angelholm-wet-night-v1.loftline.json");
    expect(exportFileName("!!!", 2)).toBe("layout-v2.loftline.json");
  });
});
