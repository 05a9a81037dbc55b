/**
 * The analysis overlay in the browser, asked for with a plain abortable fetch rather than a router
 * fetcher (docs/decisions/0501-analysis-requests-outside-the-router.md): a failed request must never
 * replace the page with an error page. Both hooks ask only for the overlay, which is all they draw.
 * - `useAnalysis` (the editor): a moment after the drawing stops changing, the draft document goes
 *   to POST /api/analysis; the last overlay stays on screen while a newer one is worked out.
 * - `useStoredAnalysis` (the read-only plan): the saved layout's overlay from the cached
 *   GET /api/layouts/:id/analysis (ETag: the browser's repeat is a 304), without sending the
 *   document back.
 */
import { useEffect, useRef, useState } from "react";
import type { AnalysisOverlay, SkillLevel } from "~/analysis";
import type { LayoutDocument } from "~/analysis";

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

/**
 * The address of a saved layout's overlay: the car (a class id or "profile:<id>"), the skill and
 * the version read (the reading's query, e.g. `{ version: "6" }`; {} for the reader's default).
 */
export function storedAnalysisUrl(
  layoutId: string,
  car: string | undefined,
  skill: Skill,
  version: Readonly<Record<string, string>> = {},
): string {
  const query = new URLSearchParams({ ...version, ...(car ? { car } : {}), skill, only: "overlay" });
  return `/api/layouts/${encodeURIComponent(layoutId)}/analysis?${query}`;
}

type StoredAnswer = {
  overlay?: AnalysisOverlay;
  version?: number;
  readVersion?: number | null;
  error?: string;
  issues?: { path: string; message: string }[];
} | null;

/**
 * The saved layout's overlay for a car and skill, from the analysis API's cached GET.
 * @param shown the version the page shows: the layout's version for a draft, or the saved
 *   version's number read (`read`, null for the draft); an answer for another one says to reload.
 */
export function useStoredAnalysis(
  layoutId: string,
  shown: { version: number; read: number | null; query?: Readonly<Record<string, string>> },
  car: string | undefined,
  skill: Skill,
) {
  const [overlay, setOverlay] = useState<AnalysisOverlay | null>(null);
  const [status, setStatus] = useState<AnalysisStatus>({ state: "idle", message: null });
  const url = storedAnalysisUrl(layoutId, car, skill, shown.query);
  const { version, read } = shown;

  useEffect(() => {
    const controller = new AbortController();
    (async () => {
      setStatus((s) => ({ state: "working", message: s.message }));
      try {
        const response = await fetch(url, {
          headers: { Accept: "application/json" },
          credentials: "same-origin",
          signal: controller.signal,
        });
        const body = (await response.json().catch(() => null)) as StoredAnswer;
        if (!response.ok || !body?.overlay) {
          setStatus({ state: "failed", message: failure(response.status, body) });
          return;
        }
        const same = read === null ? body.version === version : body.readVersion === read;
        if (!same) {
          setOverlay(null);
          setStatus({
            state: "failed",
            message:
              "The layout was changed after this page was opened: reload the page to see the analysis.",
          });
          return;
        }
        setOverlay(body.overlay);
        setStatus({ state: "ready", message: null });
      } catch (error) {
        if (controller.signal.aborted) return;
        setStatus({
          state: "failed",
          message: `The analysis could not be reached (${(error as Error).message}). Reload the page to try again.`,
        });
      }
    })();
    return () => controller.abort();
  }, [url, version, read]);

  return { overlay, status };
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
