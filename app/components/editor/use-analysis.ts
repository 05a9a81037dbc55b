/**
 * The analysis overlay in the browser, asked for with a plain abortable fetch rather than a router
 * fetcher (docs/decisions/0501-analysis-requests-outside-the-router.md): a failed request must never
 * replace the page with an error page. It asks only for the overlay, which is all the editor draws:
 * a moment after the drawing stops changing, the draft document goes to POST /api/analysis; the
 * last overlay stays on screen while a newer one is worked out. (The read-only plan is drawn on the
 * server, decision 0812.)
 */
import { useEffect, useRef, useState } from "react";
import type { AnalysisOverlay, SkillLevel, LayoutDocument } from "~/analysis";

export type AnalysisState = "idle" | "working" | "ready" | "unavailable" | "failed";

export interface AnalysisStatus {
  state: AnalysisState;
  /** What went wrong, in plain words (failed or unavailable). */
  message: string | null;
}

export type Skill = SkillLevel;

/** Delay after the last change before asking, ms. */
export const ANALYSIS_DELAY_MS = 400;
/** After a 404 (the analysis service is not there), wait this long before asking again, ms. */
const UNAVAILABLE_RETRY_MS = 30_000;

/**
 * @param classId a car class id, or "profile:<id>" of the reader's own car profile (sent as `car`).
 * @param layoutId the saved layout the draft belongs to: the club's own track guidance then applies.
 */
export function useAnalysis(
  doc: LayoutDocument,
  classId: string | undefined,
  skill: Skill,
  layoutId?: string,
  endpoint = "/api/analysis",
) {
  const [result, setResult] = useState<{ overlay: AnalysisOverlay; doc: LayoutDocument } | null>(null);
  const [status, setStatus] = useState<AnalysisStatus>({ state: "idle", message: null });
  const unavailableUntil = useRef(0);

  useEffect(() => {
    const controller = new AbortController();
    const timer = window.setTimeout(async () => {
      if (Date.now() < unavailableUntil.current) return;
      setStatus((s) => ({ state: "working", message: s.message }));
      try {
        const response = await fetch(endpoint, {
          method: "POST",
          headers: { "Content-Type": "application/json", Accept: "application/json" },
          body: JSON.stringify({
            document: doc,
            ...(classId?.startsWith("profile:") ? { car: classId } : { classId }),
            skill,
            layoutId,
            only: "overlay",
          }),
          credentials: "same-origin",
          signal: controller.signal,
        });
        if (response.status === 404 && !(response.headers.get("Content-Type") ?? "").includes("json")) {
          unavailableUntil.current = Date.now() + UNAVAILABLE_RETRY_MS;
          setStatus({
            state: "unavailable",
            message: "The analysis is not available on this server yet; closure is still worked out here.",
          });
          return;
        }
        const body = (await response.json().catch(() => null)) as {
          overlay?: AnalysisOverlay;
          error?: string;
          issues?: { path: string; message: string }[];
        } | null;
        if (!response.ok || !body?.overlay) {
          setStatus({ state: "failed", message: failure(response.status, body) });
          return;
        }
        setResult({ overlay: body.overlay, doc });
        setStatus({ state: "ready", message: null });
      } catch (error) {
        if (controller.signal.aborted) return;
        setStatus({
          state: "failed",
          message: `The analysis could not be reached (${(error as Error).message}). It is asked again after the next change.`,
        });
      }
    }, ANALYSIS_DELAY_MS);
    return () => {
      window.clearTimeout(timer);
      controller.abort();
    };
  }, [doc, classId, skill, layoutId, endpoint]);

  return { overlay: result?.overlay ?? null, overlayDoc: result?.doc ?? null, status };
}

function failure(
  status: number,
  body: { error?: string; issues?: { path: string; message: string }[] } | null,
): string {
  const issue = body?.issues?.[0];
  if (status === 400 && issue)
    return `The analysis needs a complete layout: ${issue.path.replace(/^document\./, "")} ${issue.message}.`;
  if (status === 401) return "Your session has ended: sign in again in another tab, then make a change.";
  return body?.error ? `The analysis failed: ${body.error}` : `The analysis failed (error ${status}).`;
}
