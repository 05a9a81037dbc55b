import { describe, expect, it } from "vitest";
import { EXAMPLE_LAYOUT } from "~/analysis";
import { parseSaveRequest } from "~/lib/editor/save-request";

describe("the save request", () => {
  it("accepts a save with the document and the version it started from", () => {
    const out = parseSaveRequest({ intent: "save", document: EXAMPLE_LAYOUT, baseVersion: 3 });
    expect(out.ok).toBe(true);
    expect(out.ok && out.request).toMatchObject({
      intent: "save",
      baseVersion: 3,
      document: { name: "Example oval" },
    });
  });

  it("accepts form fields: the document as JSON text and the version as text", () => {
    const out = parseSaveRequest({
      intent: "save",
      document: JSON.stringify(EXAMPLE_LAYOUT),
      baseVersion: "2",
    });
    expect(out.ok && out.request.baseVersion).toBe(2);
  });

  it("names the field of every problem, inside the document too", () => {
    const bad = structuredClone(EXAMPLE_LAYOUT) as Record<string, unknown> & {
      sections: Record<string, unknown>[];
    };
    bad.sections[1].radius = -2;
    const out = parseSaveRequest({ intent: "save", document: bad });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues).toContainEqual({
      path: "baseVersion",
      message: "is required: the version of the layout the changes started from",
    });
    expect(out.issues).toContainEqual({
      path: "document.sections[1].radius",
      message: "must be at least 1 m",
    });
    expect(out.error).toMatch(/^Not saved: /);
  });

  it("refuses an unknown intent, a missing document and a body that is not an object", () => {
    expect(parseSaveRequest({ intent: "publish", document: EXAMPLE_LAYOUT })).toMatchObject({
      ok: false,
      issues: [{ path: "intent" }],
    });
    expect(parseSaveRequest({ intent: "save-copy" })).toMatchObject({
      ok: false,
      issues: [{ path: "document", message: "is required" }],
    });
    expect(parseSaveRequest([1, 2])).toMatchObject({ ok: false, issues: [{ path: "(body)" }] });
    expect(parseSaveRequest({ intent: "save", baseVersion: 1, document: "{not json" })).toMatchObject({
      ok: false,
      issues: [{ path: "document" }],
    });
  });
});
