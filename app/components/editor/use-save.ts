/**
 * Saving through the editor route's action with a router fetcher: "save" as a new version of the
 * layout (409 when someone saved meanwhile), "save-copy" as a new layout (the editor stays and
 * says where the copy is), and reloading the saved version. The action answers every refusal as
 * data, so nothing here can replace the editor. Nothing is sent while a field shows a refused
 * value: the save is refused naming the fields, and the first one gets the focus.
 */
import { useEffect, useRef, useState } from "react";
import { useFetcher } from "react-router";
import type { LayoutDocument } from "~/analysis";
import { nameFields, type FieldProblem } from "./field-problems";

type SaveResponse =
  | { ok: true; intent: "save"; version: number }
  | { ok: true; intent: "save-copy"; layoutId: string; url: string; name: string }
  | {
      ok: false;
      error: string;
      field?: string | null;
      issues?: { path: string; message: string }[];
      conflict?: { yours: number; current: number };
    };

export type SaveOutcome =
  | { kind: "none" }
  | { kind: "saved"; version: number }
  | { kind: "copied"; url: string; name: string; layoutId: string }
  | { kind: "conflict"; message: string }
  | { kind: "refused"; message: string; field: string | null };

interface Options {
  layoutId: string;
  present: LayoutDocument;
  baseVersion: number;
  onSaved(doc: LayoutDocument, version: number): void;
  onReloaded(doc: LayoutDocument, version: number): void;
  /** Fields showing a refused value right now: nothing is saved while there are any. */
  problems: readonly FieldProblem[];
}

function outcomeOf(data: SaveResponse | undefined): SaveOutcome {
  if (!data) return { kind: "none" };
  if (data.ok)
    return data.intent === "save"
      ? { kind: "saved", version: data.version }
      : { kind: "copied", url: data.url, name: data.name, layoutId: data.layoutId };
  if (data.conflict) return { kind: "conflict", message: data.error };
  return { kind: "refused", message: data.error, field: data.field ?? null };
}

export function useSave({ layoutId, present, baseVersion, onSaved, onReloaded, problems }: Options) {
  const fetcher = useFetcher({ key: `editor-save-${layoutId}` });
  const reloader = useFetcher({ key: `editor-reload-${layoutId}` });
  /** A save was refused because of fields in error; shown while any field still is. */
  const [blocked, setBlocked] = useState(false);
  // Once every field is right again, the refusal is over (a later error does not bring it back).
  if (blocked && problems.length === 0) setBlocked(false);
  const sent = useRef<LayoutDocument | null>(null);
  const handled = useRef<unknown>(null);
  const handledReload = useRef<unknown>(null);
  /** The answer the director has dealt with (closed the dialog, reloaded): no longer shown. */
  const [dismissed, setDismissed] = useState<unknown>(null);
  const action = `/layouts/${layoutId}/edit`;
  const data = fetcher.state === "idle" ? (fetcher.data as SaveResponse | undefined) : undefined;

  // Side effect of an answer, once: record the saved version.
  useEffect(() => {
    if (!data || handled.current === data) return;
    handled.current = data;
    if (data.ok && data.intent === "save") onSaved(sent.current!, data.version);
  }, [data, onSaved]);

  useEffect(() => {
    const loaded = reloader.data as { document?: LayoutDocument; version?: number } | undefined;
    if (reloader.state !== "idle" || !loaded?.document || handledReload.current === loaded) return;
    handledReload.current = loaded;
    onReloaded(loaded.document, loaded.version!);
  }, [reloader.state, reloader.data, onReloaded]);

  /** Refuses to send while a field is in error; says which and focuses the first. */
  const refuseForFields = () => {
    if (problems.length === 0) return false;
    setBlocked(true);
    document.getElementById(problems[0].inputId)?.focus();
    return true;
  };
  const fieldRefusal: SaveOutcome | null =
    blocked && problems.length
      ? {
          kind: "refused",
          message: `Not saved: ${nameFields(problems)} ${problems.length > 1 ? "show" : "shows"} a value that is refused. Correct ${problems.length > 1 ? "them" : "it"} first.`,
          field: problems[0].label,
        }
      : null;
  return {
    outcome:
      fieldRefusal ?? (data && data !== dismissed ? outcomeOf(data) : ({ kind: "none" } as SaveOutcome)),
    busy: fetcher.state !== "idle" || reloader.state !== "idle",
    save() {
      if (fetcher.state !== "idle" || refuseForFields()) return;
      setBlocked(false);
      sent.current = present;
      fetcher.submit({ intent: "save", document: present, baseVersion } as never, {
        method: "post",
        action,
        encType: "application/json",
      });
    },
    saveCopy() {
      if (fetcher.state !== "idle" || refuseForFields()) return;
      setBlocked(false);
      fetcher.submit({ intent: "save-copy", document: present } as never, {
        method: "post",
        action,
        encType: "application/json",
      });
    },
    reload() {
      setDismissed(fetcher.data);
      reloader.load(action);
    },
    dismiss() {
      setDismissed(fetcher.data);
    },
  };
}
