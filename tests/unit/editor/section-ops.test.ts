import { describe, expect, it } from "vitest";
import { JUMP_PRESETS, parseLayoutDocument, starterDocument } from "~/analysis";
import {
  changeSectionKind,
  deleteSection,
  duplicateSection,
  freeSectionId,
  insertSection,
  moveSection,
  newSection,
  updateSection,
} from "~/lib/editor/section-ops";

const base = () => starterDocument("Ops test", 3);

describe("adding sections", () => {
  it("adds after the selected section, or at the end when nothing is selected", () => {
    const doc = base();
    const straight = newSection(doc, "straight");
    const after = insertSection(doc, straight, 1);
    expect(after.index).toBe(2);
    expect(after.doc.sections.map((s) => s.id)).toEqual(["s1", "t1", straight.id, "s2", "t2"]);
    const atEnd = insertSection(doc, straight, null);
    expect(atEnd.index).toBe(4);
    expect(atEnd.doc.sections[4]).toBe(straight);
    // the original document is unchanged (the undo history keeps it by reference)
    expect(doc.sections).toHaveLength(4);
  });

  it("gives every new section an id no other section has", () => {
    let doc = base();
    for (let k = 0; k < 12; k++)
      doc = insertSection(doc, newSection(doc, k % 2 ? "turn-left" : "straight"), null).doc;
    const ids = doc.sections.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(freeSectionId({ sections: [{ id: "s2", kind: "straight", length: 1 }] }, "straight")).toBe("s3");
  });

  it("makes turns of the asked direction and jumps of every preset that pass the format's checks", () => {
    const doc = base();
    expect(newSection(doc, "turn-right")).toMatchObject({
      kind: "turn",
      direction: "right",
      radius: 6,
      angleDeg: 90,
    });
    for (const preset of JUMP_PRESETS) {
      const jump = newSection(doc, "jump", preset);
      const withJump = insertSection(doc, jump, 0).doc;
      const parsed = parseLayoutDocument(withJump);
      expect(parsed.ok, `${preset}: ${JSON.stringify(!parsed.ok && parsed.issues)}`).toBe(true);
    }
  });
});

describe("deleting, reordering, duplicating, changing", () => {
  it("deletes a section but refuses to delete the last one", () => {
    const doc = base();
    const less = deleteSection(doc, 1)!;
    expect(less.sections.map((s) => s.id)).toEqual(["s1", "s2", "t2"]);
    let one = doc;
    while (one.sections.length > 1) one = deleteSection(one, 0)!;
    expect(deleteSection(one, 0)).toBeNull();
    expect(deleteSection(doc, 9)).toBeNull();
  });

  it("moves a section to a new place in the lap", () => {
    const doc = base();
    expect(moveSection(doc, 0, 2).sections.map((s) => s.id)).toEqual(["t1", "s2", "s1", "t2"]);
    expect(moveSection(doc, 3, 0).sections.map((s) => s.id)).toEqual(["t2", "s1", "t1", "s2"]);
    expect(moveSection(doc, 0, 7)).toBe(doc);
  });

  it("duplicates a section right after it with a fresh id and the same shape", () => {
    const doc = base();
    const out = duplicateSection(doc, 1)!;
    expect(out.index).toBe(2);
    expect(out.doc.sections[2]).toMatchObject({ kind: "turn", radius: 8, angleDeg: 180, direction: "left" });
    expect(out.doc.sections[2].id).not.toBe("t1");
  });

  it("changes fields and kinds in place, keeping the id", () => {
    const doc = base();
    expect(updateSection(doc, 0, { length: 12.5 }).sections[0]).toEqual({
      id: "s1",
      kind: "straight",
      length: 12.5,
    });
    const asJump = changeSectionKind(doc, 0, "jump", "double");
    expect(asJump.sections[0]).toMatchObject({ id: "s1", kind: "jump", preset: "double" });
    // a turn becoming a straight keeps its plan length: 8 m * pi = 25.1 m
    expect(changeSectionKind(doc, 1, "straight").sections[1]).toEqual({
      id: "t1",
      kind: "straight",
      length: 25.1,
    });
  });
});
