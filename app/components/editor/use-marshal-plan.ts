/**
 * The marshal plan while editing (decision 0714): a moment after the drawing stops changing, the
 * draft goes to POST /api/layouts/:layoutId/marshal-plan for its points' warnings (only when it has
 * points); `suggest()` asks for a suggested set. A plain abortable fetch like use-analysis.ts:
 * a failed request leaves a message, never an error page. `useMarshalOnPlan` adds what the plan
 * canvas draws of it (the zones and hotspots) and the "Show marshal zones" tick box.
 */
import { useCallback, useEffect, useMemo, useState } from "react";
import type { LayoutDocument } from "~/analysis";
import { marshalPlanFits } from "~/lib/editor/marshal-drawing";
import type { EditorMarshalPlan } from "~/lib/editor/marshal-plan-types";
import type { CanvasMarshal } from "./canvas-types";

const DELAY_MS = 700;

async function ask(
  layoutId: string,
  document: LayoutDocument,
  suggest: boolean,
  signal?: AbortSignal,
): Promise<EditorMarshalPlan> {
  const response = await fetch(`/api/layouts/${layoutId}/marshal-plan`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Accept: "application/json" },
    body: JSON.stringify({ document, suggest }),
    credentials: "same-origin",
    signal,
  });
  const body = (await response.json().catch(() => null)) as
    (EditorMarshalPlan & { error?: string; issues?: { path: string; message: string }[] }) | null;
  if (!response.ok || !body?.points) {
    const issue = body?.issues?.[0];
    throw new Error(
      issue
        ? `${issue.path.replace(/^document\./, "")} ${issue.message}`
        : (body?.error ?? `error ${response.status}`),
    );
  }
  return body;
}

export type MarshalPlanState = ReturnType<typeof useMarshalPlan>;

export function useMarshalPlan(doc: LayoutDocument, layoutId: string) {
  const [plan, setPlan] = useState<{ plan: EditorMarshalPlan; doc: LayoutDocument } | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const hasPoints = doc.marshalPoints.length > 0;

  useEffect(() => {
    if (!hasPoints) return;
    const controller = new AbortController();
    const timer = window.setTimeout(async () => {
      try {
        setPlan({ plan: await ask(layoutId, doc, false, controller.signal), doc });
        setMessage(null);
      } catch (error) {
        if (controller.signal.aborted) return;
        setMessage(`The marshal point checks could not be made: ${(error as Error).message}.`);
      }
    }, DELAY_MS);
    return () => {
      window.clearTimeout(timer);
      controller.abort();
    };
  }, [doc, layoutId, hasPoints]);

  /** Asks for a suggested set; resolves to it, or null with the message set. */
  const suggest = useCallback(async () => {
    setBusy(true);
    try {
      const answer = await ask(layoutId, doc, true);
      setMessage(null);
      return answer.suggested;
    } catch (error) {
      setMessage(`No suggestion could be made: ${(error as Error).message}.`);
      return null;
    } finally {
      setBusy(false);
    }
  }, [doc, layoutId]);

  return {
    plan: hasPoints ? (plan?.plan ?? null) : null,
    /** The drawing the plan was made for (its zones stand on that drawing's track). */
    planDoc: hasPoints ? (plan?.doc ?? null) : null,
    stale: plan?.doc !== doc,
    message,
    busy,
    suggest,
  };
}

/**
 * The marshal plan, the "Show marshal zones" tick box (on by default) and what the plan canvas
 * draws: the zones and hotspots, faded while a newer change is checked, hidden after a change of
 * the track (they would stand in the wrong place) or when the tick box is off.
 */
export function useMarshalOnPlan(doc: LayoutDocument, layoutId: string) {
  const state = useMarshalPlan(doc, layoutId);
  const [showZones, setShowZones] = useState(true);
  const fits = marshalPlanFits(state.planDoc, doc);
  const { plan, stale } = state;
  const canvas = useMemo<CanvasMarshal | null>(
    () => (showZones && fits && plan ? { zones: plan.zones, hotspots: plan.hotspots, stale } : null),
    [showZones, fits, plan, stale],
  );
  return { state, showZones, setShowZones, canvas };
}
