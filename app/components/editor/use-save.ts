/**
 * Saving through the editor route's action with a router fetcher: "save" as a new version of the
 * layout (409 when someone saved meanwhile), "save-copy" as a new layout, and reloading the saved
 * version. The action answers every refusal as data, so nothing here can replace the editor.
 */
import { useEffect, useRef, useState } from "react";
import { useFetcher, useNavigate } from "react-router";
import type { LayoutDocument } from "~/analysis";

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
  | { kind: "conflict"; message: string }
  | { kind: "refused"; message: string; field: string | null };

interface Options {
  layoutId: string;
  present: LayoutDocument;
  baseVersion: number;
  onSaved(doc: LayoutDocument, version: number): void;
  onReloaded(doc: LayoutDocument, version: number): void;
  /** Lets the navigation to the copy through the unsaved-changes guard. */
  beforeLeave(): void;
}

function outcomeOf(data: SaveResponse | undefined): SaveOutcome {
  if (!data) return { kind: "none" };
  if (data.ok) return data.intent === "save" ? { kind: "saved", version: data.version } : { kind: "none" };
  if (data.conflict) return { kind: "conflict", message: data.error };
  return { kind: "refused", message: data.error, field: data.field ?? null };
}

export function useSave({ layoutId, present, baseVersion, onSaved, onReloaded, beforeLeave }: Options) {
  const fetcher = useFetcher({ key: `editor-save-${layoutId}` });
  const reloader = useFetcher({ key: `editor-reload-${layoutId}` });
  const navigate = useNavigate();
  const sent = useRef<LayoutDocument | null>(null);
  const handled = useRef<unknown>(null);
  const handledReload = useRef<unknown>(null);
  /** The answer the director has dealt with (closed the dialog, reloaded): no longer shown. */
  const [dismissed, setDismissed] = useState<unknown>(null);
  const action = `/layouts/${layoutId}/edit`;
  const data = fetcher.state === "idle" ? (fetcher.data as SaveResponse | undefined) : undefined;

  // Side effects of an answer, once each: record the saved version, or go to the copy.
  useEffect(() => {
    if (!data || handled.current === data) return;
    handled.current = data;
    if (data.ok && data.intent === "save") onSaved(sent.current!, data.version);
    if (data.ok && data.intent === "save-copy") {
      beforeLeave();
      navigate(data.url);
    }
  }, [data, onSaved, beforeLeave, navigate]);

  useEffect(() => {
    const loaded = reloader.data as { document?: LayoutDocument; version?: number } | undefined;
    if (reloader.state !== "idle" || !loaded?.document || handledReload.current === loaded) return;
    handledReload.current = loaded;
    onReloaded(loaded.document, loaded.version!);
  }, [reloader.state, reloader.data, onReloaded]);

  return {
    outcome: data && data !== dismissed ? outcomeOf(data) : ({ kind: "none" } as SaveOutcome),
    busy: fetcher.state !== "idle" || reloader.state !== "idle",
    save() {
      if (fetcher.state !== "idle") return;
      sent.current = present;
      fetcher.submit({ intent: "save", document: present, baseVersion } as never, {
        method: "post",
        action,
        encType: "application/json",
      });
    },
    saveCopy() {
      if (fetcher.state !== "idle") return;
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
