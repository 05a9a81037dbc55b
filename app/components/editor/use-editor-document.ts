/**
 * The editor's document state: the reducer of app/lib/editor/editor-state.ts, the sections chained
 * from the start and the loop's closure (worked out once per drawing), and stable callbacks the
 * canvas and the panels dispatch through.
 */
import { useCallback, useMemo, useReducer } from "react";
import { closureError, resolveSections, startPose, type LayoutDocument } from "~/analysis";
import { editorReducer, initialEditorState, type Selection } from "~/lib/editor/editor-state";

export function useEditorDocument(document: LayoutDocument, version: number) {
  const [state, dispatch] = useReducer(editorReducer, undefined, () => initialEditorState(document, version));
  const doc = state.history.present;
  const sections = useMemo(() => resolveSections(doc), [doc]);
  const closure = useMemo(() => closureError(sections, startPose(doc)), [sections, doc]);

  const change = useCallback(
    (next: LayoutDocument, gesture?: string, selection?: Selection) =>
      dispatch({ type: "change", doc: next, gesture, selection }),
    [],
  );
  const endGesture = useCallback(() => dispatch({ type: "end-gesture" }), []);
  const select = useCallback((selection: Selection) => dispatch({ type: "select", selection }), []);
  const onSaved = useCallback(
    (saved: LayoutDocument, v: number) => dispatch({ type: "saved", doc: saved, version: v }),
    [],
  );
  const onReloaded = useCallback(
    (loaded: LayoutDocument, v: number) => dispatch({ type: "reloaded", doc: loaded, version: v }),
    [],
  );
  /** The selected section's index, or null when no section is selected. */
  const selected = state.selection?.kind === "section" ? state.selection.index : null;

  return {
    state,
    dispatch,
    doc,
    sections,
    closure,
    selected,
    change,
    endGesture,
    select,
    onSaved,
    onReloaded,
  };
}

export type EditorDocument = ReturnType<typeof useEditorDocument>;
