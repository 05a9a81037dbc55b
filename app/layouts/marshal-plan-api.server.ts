/**
 * The editor's marshal plan (decision 0714): a director's draft document analysed with the club's
 * guidance (through the pool and its memo), then the engine's marshal plan for every class of the
 * document with the club's reach and heat size: each point's warnings with what to do, the zones, the hotspots,
 * and on request a suggested set of points. Nothing is saved.
 */
import { marshalPlan, parseLayoutDocument } from "~/analysis";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { loadClubGuidance } from "~/clubs/guidance.server";
import { loadClubMarshal } from "~/clubs/marshal-settings.server";
import { ONE_MEGABYTE, readJsonBody } from "~/lib/json-body.server";
import { clubMarshalSettings } from "~/lib/schemas/marshal-settings";
import type { EditorMarshalPlan } from "~/lib/editor/marshal-plan-types";
import { analyseDocument } from "./analysis.server";
import { countAnalysisRequest } from "./analysis-rate.server";
import { analysisRefusal, badRequest } from "./analysis-response.server";

/** Answers POST /api/layouts/:layoutId/marshal-plan `{ document, suggest? }` (directors only). */
export async function editorMarshalPlan(request: Request, layoutId: string | undefined): Promise<Response> {
  const { layout, user } = await requireLayoutAccess(request, layoutId, "director", { api: true });
  await countAnalysisRequest(user.id);
  const body = await readJsonBody(request, ONE_MEGABYTE);
  if (typeof body !== "object" || body === null || Array.isArray(body))
    return badRequest([{ path: "(body)", message: "must be a JSON object { document, suggest? }" }]);
  const input = body as Record<string, unknown>;
  if (input.suggest !== undefined && typeof input.suggest !== "boolean")
    return badRequest([{ path: "suggest", message: "must be true or false" }]);
  if (input.document === undefined) return badRequest([{ path: "document", message: "is required" }]);
  const parsed = parseLayoutDocument(typeof input.document === "string" ? null : input.document);
  if (!parsed.ok) {
    const issues = parsed.issues.map((i) => ({
      path: i.path === "(document)" ? "document" : `document.${i.path}`,
      message: i.message,
    }));
    return badRequest(issues, `The layout document is not complete: ${issues.length} problem(s) found.`);
  }
  try {
    const guidance = await loadClubGuidance(layout.clubId);
    const run = await analyseDocument(parsed.document, {
      skill: "club",
      guidance,
      fieldPrefix: "document.",
      owner: user.id,
    });
    const settings = clubMarshalSettings(await loadClubMarshal(layout.clubId));
    const plan = marshalPlan(parsed.document, run.analysis, { settings, suggest: input.suggest === true });
    const answer: EditorMarshalPlan = {
      settings: { reach: plan.settings.reach, heatSize: plan.settings.heatSize },
      points: plan.points.map((p) => ({ id: p.id, x: p.x, y: p.y, warnings: p.warnings })),
      zones: plan.zones.map((z) => ({ id: z.id, kind: z.kind, title: z.title, polygon: z.polygon })),
      hotspots: plan.hotspots.map((h) => ({
        id: h.id,
        kind: h.kind,
        score: h.score,
        reason: h.reason,
        x: h.x,
        y: h.y,
      })),
      suggested: plan.suggested
        ? {
            asked: plan.suggested.asked,
            points: plan.suggested.points.map((p) => ({ x: p.x, y: p.y })),
            uncovered: plan.suggested.uncovered,
          }
        : null,
    };
    return Response.json(answer);
  } catch (error) {
    if (error instanceof Response) throw error;
    return analysisRefusal(error, "document.");
  }
}
