/**
 * A copy of unsaved changes in this browser (localStorage), so a closed tab, a crash or an error
 * page loses nothing: opening the editor again offers to bring the changes back.
 */
import { useEffect, useState } from "react";
import { parseLayoutDocument, type LayoutDocument } from "~/analysis";

export interface DraftBackup {
  document: LayoutDocument;
  baseVersion: number;
  /** When the copy was written, ms since 1970. */
  savedAt: number;
}

const key = (layoutId: string) => `loftline-draft:${layoutId}`;

function read(layoutId: string): DraftBackup | null {
  try {
    const raw = window.localStorage.getItem(key(layoutId));
    if (!raw) return null;
    const value = JSON.parse(raw) as DraftBackup;
    const parsed = parseLayoutDocument(value.document);
    // A draft may be incomplete (one section); keep it anyway: the editor can hold it.
    return typeof value.savedAt === "number"
      ? { ...value, document: parsed.ok ? parsed.document : value.document }
      : null;
  } catch {
    return null;
  }
}

/**
 * Writes the present document a second after the last change while it differs from the saved one;
 * removes the copy once saved. Returns a copy found at start that differs from what was loaded.
 */
export function useDraftBackup(
  layoutId: string,
  present: LayoutDocument,
  dirty: boolean,
  baseVersion: number,
  loaded: LayoutDocument,
) {
  const [found, setFound] = useState<DraftBackup | null>(null);
  useEffect(() => {
    const backup = read(layoutId);
    // Reading the browser's storage after hydration (the server has none): an outside system.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    if (backup && stableJson(backup.document) !== stableJson(loaded)) setFound(backup);
    // Only on opening the editor.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [layoutId]);
  useEffect(() => {
    // While an earlier copy waits for the director's answer, it is not overwritten.
    if (found) return;
    try {
      if (!dirty) {
        window.localStorage.removeItem(key(layoutId));
        return;
      }
    } catch {
      return;
    }
    const timer = window.setTimeout(() => {
      try {
        window.localStorage.setItem(
          key(layoutId),
          JSON.stringify({ document: present, baseVersion, savedAt: Date.now() } satisfies DraftBackup),
        );
      } catch {
        /* storage full or disabled: the prompt before leaving still guards the draft */
      }
    }, 1000);
    return () => window.clearTimeout(timer);
  }, [layoutId, present, dirty, baseVersion, found]);
  return { found, dismiss: () => setFound(null) };
}

/** JSON with object keys sorted, so two equal documents compare equal whatever their key order. */
export function stableJson(value: unknown): string {
  return JSON.stringify(value, (_key, v) =>
    v && typeof v === "object" && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}
