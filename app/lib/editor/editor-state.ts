/**
 * The editor's state and its reducer: the undo history of the document, the selection, the drag
 * in progress and the last saved document. Pure, so every command is unit tested without a browser.
 */
import type { LayoutDocument } from "~/analysis";
import { amend, createHistory, record, redo, undo, type History } from "./history";
import { deleteSection, duplicateSection } from "./section-ops";
import { deleteBoundaryPoint, deleteMarshalPoint, removeDriverStand } from "./site-ops";
import { nudge } from "./nudge";

export type Selection =
  | { kind: "section"; index: number }
  | { kind: "marshal"; index: number }
  | { kind: "stand" }
  | { kind: "boundary"; index: number }
  | { kind: "photo" }
  | null;

export interface EditorState {
  history: History<LayoutDocument>;
  selection: Selection;
  /** Id of the drag in progress: its later moves amend the undo step of its first move. */
  gesture: string | null;
  /** The document as last saved or loaded; the editor has unsaved changes when the present differs. */
  saved: LayoutDocument;
  /** The layout version the next save starts from (optimistic concurrency). */
  baseVersion: number;
  /** Why the last command did nothing, in plain words (shown quietly, cleared by the next change). */
  notice: string | null;
}

export type EditorAction =
  | { type: "change"; doc: LayoutDocument; selection?: Selection; gesture?: string }
  | { type: "end-gesture" }
  | { type: "select"; selection: Selection }
  | { type: "undo" }
  | { type: "redo" }
  | { type: "delete-selected" }
  | { type: "duplicate-selected" }
  | { type: "nudge"; dx: number; dy: number }
  | { type: "saved"; doc: LayoutDocument; version: number }
  | { type: "reloaded"; doc: LayoutDocument; version: number }
  | { type: "notice"; message: string | null };

export function initialEditorState(doc: LayoutDocument, baseVersion: number): EditorState {
  return {
    history: createHistory(doc),
    selection: null,
    gesture: null,
    saved: doc,
    baseVersion,
    notice: null,
  };
}

export function isDirty(s: EditorState): boolean {
  return s.history.present !== s.saved;
}

/** Keeps a selection pointing at something that still exists after undo, redo or a delete. */
export function validSelection(doc: LayoutDocument, sel: Selection): Selection {
  if (!sel) return null;
  switch (sel.kind) {
    case "section":
      return sel.index < doc.sections.length
        ? sel
        : doc.sections.length
          ? { kind: "section", index: doc.sections.length - 1 }
          : null;
    case "marshal":
      return sel.index < doc.marshalPoints.length ? sel : null;
    case "boundary":
      return doc.siteBoundary && sel.index < doc.siteBoundary.length ? sel : null;
    case "stand":
      return doc.driverStand ? sel : null;
    case "photo":
      return doc.background ? sel : null;
  }
}

function commit(
  s: EditorState,
  doc: LayoutDocument,
  selection: Selection = s.selection,
  gesture: string | null = null,
): EditorState {
  const continuing = gesture !== null && gesture === s.gesture;
  const history = continuing ? amend(s.history, doc) : record(s.history, doc);
  return { ...s, history, selection: validSelection(doc, selection), gesture, notice: null };
}

export function editorReducer(s: EditorState, a: EditorAction): EditorState {
  const doc = s.history.present;
  switch (a.type) {
    case "change":
      return commit(s, a.doc, a.selection ?? s.selection, a.gesture ?? null);
    case "end-gesture":
      return s.gesture === null ? s : { ...s, gesture: null };
    case "select":
      return { ...s, selection: validSelection(doc, a.selection), gesture: null };
    case "undo": {
      const history = undo(s.history);
      return {
        ...s,
        history,
        gesture: null,
        notice: null,
        selection: validSelection(history.present, s.selection),
      };
    }
    case "redo": {
      const history = redo(s.history);
      return {
        ...s,
        history,
        gesture: null,
        notice: null,
        selection: validSelection(history.present, s.selection),
      };
    }
    case "delete-selected":
      return deleteSelected(s);
    case "duplicate-selected": {
      if (s.selection?.kind !== "section") return { ...s, notice: "Select a section to duplicate." };
      const out = duplicateSection(doc, s.selection.index);
      return out ? commit(s, out.doc, { kind: "section", index: out.index }) : s;
    }
    case "nudge": {
      const next = nudge(doc, s.selection, a.dx, a.dy);
      return next === doc ? s : commit(s, next);
    }
    case "saved":
      // The present may have moved on while the save was in flight; only what was sent is saved.
      return { ...s, saved: a.doc, baseVersion: a.version, notice: null };
    case "reloaded": {
      // The draft stays one undo step back, so reloading never loses it.
      const history = record(s.history, a.doc);
      return {
        ...s,
        history,
        saved: a.doc,
        baseVersion: a.version,
        gesture: null,
        selection: validSelection(a.doc, s.selection),
        notice: null,
      };
    }
    case "notice":
      return { ...s, notice: a.message };
  }
}

function deleteSelected(s: EditorState): EditorState {
  const doc = s.history.present;
  const sel = s.selection;
  if (!sel) return { ...s, notice: "Select something to delete." };
  switch (sel.kind) {
    case "section": {
      const next = deleteSection(doc, sel.index);
      if (!next) return { ...s, notice: "A layout keeps at least one section." };
      return commit(
        s,
        next,
        next.sections.length
          ? { kind: "section", index: Math.min(sel.index, next.sections.length - 1) }
          : null,
      );
    }
    case "marshal":
      return commit(s, deleteMarshalPoint(doc, sel.index), null);
    case "stand":
      return commit(s, removeDriverStand(doc), null);
    case "boundary": {
      const next = deleteBoundaryPoint(doc, sel.index);
      if (!next)
        return {
          ...s,
          notice:
            "A site boundary keeps at least three corners; remove the whole boundary from the site panel.",
        };
      return commit(s, next, null);
    }
    case "photo": {
      const { background: _removed, ...rest } = doc;
      return commit(s, rest, null);
    }
  }
}
