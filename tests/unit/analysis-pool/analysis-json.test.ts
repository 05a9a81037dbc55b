import { describe, expect, it } from "vitest";
import { compactNumber, composeJson, rememberJson } from "~/analysis-pool/analysis-json";

const text = (bytes: Uint8Array) => new TextDecoder().decode(bytes);

describe("JSON answers made from a worker's JSON text", () => {
  it("splices remembered JSON in and gives the same text as serialising everything here", () => {
    const analysis = { lapLength: 123.456789123, classes: [{ classId: "sct-10", lapTime: 20.0000001 }] };
    const overlay = { classId: "sct-10", line: { x: [1.23456789, 2], y: [0.1, -0.25] } };
    const fields = { layoutId: "abc", version: 3, analysis, overlay, skipped: undefined };
    const expected = JSON.stringify(fields, compactNumber);
    expect(text(composeJson(fields))).toBe(expected);
    // A worker's own text is used as it is, not made again.
    rememberJson(analysis, new TextEncoder().encode('{"from":"worker"}'));
    expect(JSON.parse(text(composeJson(fields)))).toEqual({
      layoutId: "abc",
      version: 3,
      analysis: { from: "worker" },
      overlay: JSON.parse(JSON.stringify(overlay, compactNumber)),
    });
    expect(text(composeJson({}))).toBe("{}");
  });

  it("writes fractions to six significant digits and whole numbers as they are", () => {
    expect(JSON.stringify({ a: 1.23456789, b: 1234567890, c: -0.000123456789 }, compactNumber)).toBe(
      '{"a":1.23457,"b":1234567890,"c":-0.000123457}',
    );
  });
});
