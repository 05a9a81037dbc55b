import { describe, expect, it } from "vitest";
import { starterDocument } from "~/analysis";
import {
  editorReducer,
  initialEditorState,
  isDirty,
  type EditorAction,
  type EditorState,
} from "~/lib/editor/editor-state";
import { updateSection } from "~/lib/editor/section-ops";
import { addMarshalPoint } from "~/lib/editor/site-ops";

const start = () => initialEditorState(starterDocument("State test", 3), 4);
const run = (s: EditorState, ...actions: EditorAction[]) => actions.reduce(editorReducer, s);
const doc = (s: EditorState) => s.history.present;

describe("editor state", () => {
  it("starts clean, becomes dirty on a change and clean again when undone", () => {
    const s0 = start();
    expect(isDirty(s0)).toBe(false);
    const s1 = run(s0, { type: "change", doc: updateSection(doc(s0), 0, { length: 12 }) });
    expect(isDirty(s1)).toBe(true);
    expect(isDirty(run(s1, { type: "undo" }))).toBe(false);
  });

  it("makes one undo step of a whole drag (its moves share a gesture id)", () => {
    let s = start();
    for (const length of [31, 32, 33, 34])
      s = run(s, { type: "change", doc: updateSection(doc(s), 0, { length }), gesture: "drag-1" });
    s = run(s, { type: "end-gesture" });
    s = run(s, { type: "change", doc: updateSection(doc(s), 0, { length: 40 }), gesture: "drag-2" });
    expect(doc(s).sections[0]).toMatchObject({ length: 40 });
    s = run(s, { type: "undo" });
    expect(doc(s).sections[0]).toMatchObject({ length: 34 });
    s = run(s, { type: "undo" });
    expect(doc(s).sections[0]).toMatchObject({ length: 30 });
    s = run(s, { type: "redo" }, { type: "redo" });
    expect(doc(s).sections[0]).toMatchObject({ length: 40 });
  });

  it("deletes and duplicates the selected section, and says why when it cannot", () => {
    let s = run(
      start(),
      { type: "select", selection: { kind: "section", index: 3 } },
      { type: "delete-selected" },
    );
    expect(doc(s).sections.map((x) => x.id)).toEqual(["s1", "t1", "s2"]);
    expect(s.selection).toEqual({ kind: "section", index: 2 });
    s = run(s, { type: "duplicate-selected" });
    expect(doc(s).sections).toHaveLength(4);
    expect(s.selection).toEqual({ kind: "section", index: 3 });
    for (let k = 0; k < 3; k++) s = run(s, { type: "delete-selected" });
    expect(doc(s).sections).toHaveLength(1);
    s = run(s, { type: "delete-selected" });
    expect(doc(s).sections).toHaveLength(1);
    expect(s.notice).toBe("A layout keeps at least one section.");
    expect(run(s, { type: "select", selection: null }, { type: "duplicate-selected" }).notice).toMatch(
      /Select a section/,
    );
  });

  it("nudges the selection with the arrow keys: a marshal point, or the whole track for a section", () => {
    let s = start();
    const added = addMarshalPoint(doc(s), { x: 2, y: 2 })!;
    s = run(
      s,
      { type: "change", doc: added.doc, selection: { kind: "marshal", index: 0 } },
      { type: "nudge", dx: 0.1, dy: 0 },
      { type: "nudge", dx: 0, dy: -1 },
    );
    expect(doc(s).marshalPoints[0]).toEqual({ x: 2.1, y: 1 });
    s = run(
      s,
      { type: "select", selection: { kind: "section", index: 0 } },
      { type: "nudge", dx: -1, dy: 0.1 },
    );
    expect(doc(s).start).toMatchObject({ x: -1, y: 0.1 });
    const none = run(s, { type: "select", selection: null });
    expect(run(none, { type: "nudge", dx: 1, dy: 1 })).toBe(none);
  });

  it("keeps the selection valid after undoing the step that created the selected thing", () => {
    let s = start();
    const added = addMarshalPoint(doc(s), { x: 2, y: 2 })!;
    s = run(
      s,
      { type: "change", doc: added.doc, selection: { kind: "marshal", index: 0 } },
      { type: "undo" },
    );
    expect(s.selection).toBeNull();
  });

  it("after saving, only what was sent counts as saved; a reload keeps the draft one undo step back", () => {
    let s = run(start(), { type: "change", doc: updateSection(doc(start()), 0, { length: 11 }) });
    const sent = doc(s);
    s = run(
      s,
      { type: "change", doc: updateSection(sent, 0, { length: 12 }) },
      { type: "saved", doc: sent, version: 5 },
    );
    expect(s.baseVersion).toBe(5);
    expect(isDirty(s)).toBe(true);
    const theirs = starterDocument("Saved by someone else", 3);
    const draft = doc(s);
    s = run(s, { type: "reloaded", doc: theirs, version: 7 });
    expect(doc(s)).toBe(theirs);
    expect(isDirty(s)).toBe(false);
    expect(s.baseVersion).toBe(7);
    expect(doc(run(s, { type: "undo" }))).toBe(draft);
  });
});
