import { useEffect, useRef } from "react";
import { NUDGE_STEP, NUDGE_STEP_LARGE } from "~/lib/editor/nudge";

export interface EditorKeyHandlers {
  deleteSelected(): void;
  undo(): void;
  redo(): void;
  duplicate(): void;
  nudge(dx: number, dy: number): void;
  escape(): void;
  save(): void;
  fit(): void;
}

/** The shortcuts, as the help panel lists them. */
export const SHORTCUTS: { keys: string; action: string }[] = [
  {
    keys: "Delete or Backspace",
    action: "Delete the selected section, marshal point, corner, stand or photo",
  },
  { keys: "Ctrl+Z (⌘Z)", action: "Undo" },
  { keys: "Ctrl+Shift+Z or Ctrl+Y", action: "Redo" },
  { keys: "Ctrl+D (⌘D)", action: "Duplicate the selected section" },
  { keys: "Arrow keys", action: `Nudge the selection ${NUDGE_STEP} m (a section moves the whole track)` },
  { keys: "Shift+arrow keys", action: `Nudge ${NUDGE_STEP_LARGE} m` },
  { keys: "Ctrl+S (⌘S)", action: "Save a new version (also while typing in a field)" },
  { keys: "F", action: "Fit the layout into view" },
  { keys: "Escape", action: "Clear the selection, stop placing" },
  { keys: "Space+drag, or drag the background", action: "Pan" },
  { keys: "Mouse wheel", action: "Zoom about the cursor" },
];

function typingIn(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLElement &&
    (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName))
  );
}

/**
 * Editor shortcuts on the whole page, except while typing in a field or while a dialog is open.
 * Ctrl+S (Cmd+S) saves from anywhere, fields included, and never opens the browser's "Save page
 * as" dialog, even while a dialog of the editor is open (it then does nothing).
 */
export function useEditorKeys(handlers: EditorKeyHandlers, enabled: boolean) {
  const ref = useRef(handlers);
  const on = useRef(enabled);
  useEffect(() => {
    ref.current = handlers;
    on.current = enabled;
  });
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const h = ref.current;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      if (mod && key === "s" && !e.altKey) {
        e.preventDefault();
        if (on.current && !document.querySelector("dialog[open]")) h.save();
        return;
      }
      if (!on.current || typingIn(e.target)) return;
      if (document.querySelector("dialog[open]")) return;
      let handled = true;
      if (mod && key === "z" && !e.shiftKey) h.undo();
      else if (mod && (key === "y" || (key === "z" && e.shiftKey))) h.redo();
      else if (mod && key === "d") h.duplicate();
      else if (mod || e.altKey) handled = false;
      else if (e.key === "Delete" || e.key === "Backspace") h.deleteSelected();
      else if (e.key === "Escape") h.escape();
      else if (key === "f") h.fit();
      else if (e.key.startsWith("Arrow")) {
        const step = e.shiftKey ? NUDGE_STEP_LARGE : NUDGE_STEP;
        const dx = e.key === "ArrowLeft" ? -step : e.key === "ArrowRight" ? step : 0;
        const dy = e.key === "ArrowDown" ? -step : e.key === "ArrowUp" ? step : 0;
        h.nudge(dx, dy);
      } else handled = false;
      if (handled) e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
}
