import { describe, expect, it } from "vitest";
import type { Hotspot, MarshalPointReport } from "~/analysis";
import {
  hotspotLine,
  MARSHAL_CAUTIONS,
  POINT_COLUMNS,
  pointRows,
  stretchText,
  placeText,
} from "~/lib/risk-sheet-rows";

const hotspot: Hotspot = {
  id: "H1",
  kind: "overshoot",
  score: 4,
  reason: "Cars that overshoot J2 land on the flat beside M1.",
  subject: "J2",
  s: 40,
  fromS: 38,
  toS: 60,
  x: 10,
  y: 5,
  classId: "buggy-2wd-10",
  zoneId: "J2",
};

const point = (over: Partial<MarshalPointReport>): MarshalPointReport => ({
  id: "M1",
  x: 0,
  y: 0,
  s: 30,
  side: "left",
  edgeDistance: 1.2,
  stretch: { fromS: 12, toS: 48.4, length: 36.4 },
  watch: [{ hotspotId: "H1", score: 4, distance: 6, covered: true }],
  jumps: ["J2"],
  turns: ["T1"],
  warnings: [],
  ...over,
});

describe("corner-risk sheet rows", () => {
  it("give one row per point with every column, in the plan's order", () => {
    const rows = pointRows({
      points: [
        point({}),
        point({
          id: "M2",
          watch: [],
          jumps: [],
          turns: [],
          warnings: [
            {
              kind: "in-zone",
              zoneId: "J2",
              text: "M2 stands in the overshoot zone of J2.",
              action: "Move it beside the landing.",
              moveTo: [1, 2],
            },
          ],
        }),
      ],
      hotspots: [hotspot],
    });
    expect(rows.map((r) => r.point)).toEqual(["M1", "M2"]);
    for (const r of rows) expect(Object.keys(r).sort()).toEqual(POINT_COLUMNS.map((c) => c.id).sort());
    expect(rows[0].stretch).toBe("12 to 48 m from the start (36 m); 1.2 m from the left-hand edge");
    expect(rows[0].watch).toBe("H1 Overshoot beyond a landing (4, very dangerous)");
    expect(rows[0].marks).toBe("J2; T1");
    expect(rows[0].warnings).toBe("None");
    expect(rows[1].watch).toMatch(/No hotspot/);
    expect(rows[1].marks).toBe("-");
    expect(rows[1].warnings).toBe(
      "Inside a zone: M2 stands in the overshoot zone of J2. Move it beside the landing.",
    );
  });

  it("say when a stretch crosses the start and when a point stands on the track", () => {
    expect(stretchText(point({ stretch: { fromS: 280, toS: 5, length: 26 } }))).toMatch(/across the start/);
    expect(placeText({ side: "right", edgeDistance: -0.5 })).toBe("on the track");
  });

  it("number each hotspot with its score in words and its reason", () => {
    expect(hotspotLine(hotspot)).toBe(
      "H1 · score 4 (very dangerous) · Overshoot beyond a landing: Cars that overshoot J2 land on the flat beside M1.",
    );
  });

  it("carry every caution the issue asks for, and defer to the race director and the sanctioning body", () => {
    const all = MARSHAL_CAUTIONS.join(" ");
    for (const words of [
      "zones",
      "outside of fast turns",
      "Face the traffic",
      "stay low",
      "closed shoes",
      "eye protection",
      "hi-vis",
      "estimate",
      "race director",
      "sanctioning body",
    ])
      expect(all).toContain(words);
  });
});
