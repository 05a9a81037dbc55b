import { describe, expect, it } from "vitest";
import { analyseLayout, buildOverlay } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { packOverlay, unpackOverlay, withUnpackedOverlay } from "~/lib/packed-line";

describe("the racing line packed as one text", () => {
  const analysis = analyseLayout(SUMMER_LAYOUT, { classIds: ["buggy-2wd-10"] });
  const overlay = buildOverlay(analysis, "buggy-2wd-10", "club");

  it("comes back as the engine's line to the centimetre, every point and section index kept", () => {
    const packed = packOverlay(overlay);
    expect(typeof packed.line).toBe("string");
    const back = unpackOverlay(packed);
    expect(back.line.x).toHaveLength(overlay.line.x.length);
    expect(back.line.sectionIndex).toEqual(overlay.line.sectionIndex);
    back.line.x.forEach((x, i) => expect(Math.abs(x - overlay.line.x[i])).toBeLessThanOrEqual(0.005 + 1e-9));
    back.line.speed.forEach((v, i) =>
      expect(Math.abs(v - overlay.line.speed[i])).toBeLessThanOrEqual(0.005 + 1e-9),
    );
    expect({ ...back, line: null }).toEqual({ ...overlay, line: null });
  });

  it("unpacks a page's data only when it holds a result", () => {
    const ok = withUnpackedOverlay({ result: { ok: true as const, overlay: packOverlay(overlay) } });
    expect(ok.result.ok && ok.result.overlay.line.y.length).toBe(overlay.line.y.length);
    const failed = { result: { ok: false as const, message: "no" } };
    expect(withUnpackedOverlay(failed)).toBe(failed);
  });
});
