import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  describeLayoutIssues,
  EXAMPLE_LAYOUT,
  formatIssuePath,
  minimumGap,
  parseLayoutDocument,
  type LayoutIssue,
} from "~/analysis/format/layout-document";

/** The tests write wrong types on purpose, so the copy is untyped. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Untyped = any;

/** A deep copy of the example, changed by `edit`. */
function exampleWith(edit: (doc: Untyped) => void): unknown {
  const doc: Untyped = structuredClone(EXAMPLE_LAYOUT);
  edit(doc);
  return doc;
}

function issuesOf(json: unknown): LayoutIssue[] {
  const r = parseLayoutDocument(json);
  if (r.ok) throw new Error("expected the document to be refused");
  return r.issues;
}

describe("layout document", () => {
  it("accepts the example and fills in defaults", () => {
    const r = parseLayoutDocument(EXAMPLE_LAYOUT);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.document.sections).toHaveLength(EXAMPLE_LAYOUT.sections.length);
    const bare = exampleWith((d) => {
      delete d.units;
      delete d.guidance;
      delete d.marshalPoints;
    });
    const r2 = parseLayoutDocument(bare);
    expect(r2.ok && r2.document.units).toBe("metres-degrees");
    expect(r2.ok && r2.document.guidance).toBe("club");
    expect(r2.ok && r2.document.marshalPoints).toEqual([]);
  });

  it("survives a JSON round trip unchanged", () => {
    const first = parseLayoutDocument(JSON.stringify(EXAMPLE_LAYOUT));
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const second = parseLayoutDocument(JSON.stringify(first.document));
    expect(second.ok && second.document).toEqual(first.document);
  });

  it("names the field of a value out of range", () => {
    const issues = issuesOf(exampleWith((d) => (d.sections[1].radius = 0.5)));
    expect(issues).toEqual([{ path: "sections[1].radius", message: "must be at least 1 m" }]);
    expect(describeLayoutIssues(issues)).toBe("sections[1].radius: must be at least 1 m");
  });

  it("names missing fields, wrong types and unknown kinds", () => {
    const issues = issuesOf(
      exampleWith((d) => {
        delete d.trackWidth;
        d.start.headingDeg = "north";
        d.sections[2].kind = "bend";
        d.sections[3].preset = "kicker";
        d.surface = "gravel";
      }),
    );
    const byPath = Object.fromEntries(issues.map((i) => [i.path, i.message]));
    expect(byPath.trackWidth).toBe("is required");
    expect(byPath["start.headingDeg"]).toBe("must be a number (deg)");
    expect(byPath["sections[2].kind"]).toBe('must be "straight", "turn" or "jump"');
    expect(byPath["sections[3].preset"]).toMatch(/^must be one of "tabletop"/);
    expect(byPath.surface).toMatch(/^must be "dirt"/);
  });

  it("refuses repeated ids, bad custom profiles and inconsistent heights", () => {
    const issues = issuesOf(
      exampleWith((d) => {
        d.sections[4].id = "start";
        d.sections[5].profile[2][0] = 0.5; // goes backwards
        d.sections[5].landingStartIndex = 1; // not after the lip
        d.sections.push({
          id: "up",
          kind: "jump",
          preset: "step-up",
          faceHeight: 0.5,
          faceAngleDeg: 30,
          gap: 3,
          landingHeight: 0.4,
          deckLength: 2,
          landingAngleDeg: 25,
        });
      }),
    );
    const paths = issues.map((i) => i.path);
    expect(paths).toContain("sections[4].id");
    expect(paths).toContain("sections[5].profile[2][0]");
    expect(paths).toContain("sections[5].landingStartIndex");
    expect(paths).toContain("sections[8].landingHeight");
  });

  it("refuses a gap that buries the lower crest under the higher mound", () => {
    // Back sides are 40 deg: a 0.8 m height difference needs 0.8 / tan(40 deg) + 0.1 = 1.05 m.
    expect(minimumGap("double", 1.0, 0.2)).toBeCloseTo(0.8 / Math.tan((40 * Math.PI) / 180) + 0.1, 12);
    const issues = issuesOf(
      exampleWith((d) =>
        d.sections.push({
          id: "drop",
          kind: "jump",
          preset: "step-down",
          faceHeight: 1.5,
          faceAngleDeg: 20,
          gap: 1,
          landingHeight: 0.2,
          landingAngleDeg: 20,
        }),
      ),
    );
    expect(issues.map((i) => i.path)).toEqual(["sections[8].gap"]);
  });

  it("refuses what is not a layout document at all", () => {
    expect(issuesOf("{ not json")[0].message).toMatch(/^is not valid JSON/);
    expect(issuesOf([1, 2])).toEqual([{ path: "(document)", message: "must be a JSON object" }]);
    expect(issuesOf(exampleWith((d) => (d.format = "other"))).map((i) => i.path)).toEqual(["format"]);
    expect(issuesOf(exampleWith((d) => (d.formatVersion = 2)))[0]).toEqual({
      path: "formatVersion",
      message: "must be 1 (the only version so far)",
    });
  });

  it("the example in docs/layout-format.md is the example layout", () => {
    const block = readFileSync("docs/layout-format.md", "utf8").split("```json")[1].split("```")[0];
    const fromDocs = parseLayoutDocument(block);
    const own = parseLayoutDocument(EXAMPLE_LAYOUT);
    expect(fromDocs.ok && own.ok).toBe(true);
    expect(fromDocs.ok && fromDocs.document).toEqual(own.ok && own.document);
  });

  it("formats paths with indices", () => {
    expect(formatIssuePath(["sections", 3, "profile", 2, 0])).toBe("sections[3].profile[2][0]");
    expect(formatIssuePath([])).toBe("(document)");
  });
});
