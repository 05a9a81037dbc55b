import type { Route } from "./+types/api-layout-analysis";
import { cachedBody } from "~/analysis-cache.server";
import { analyseStoredLayout, overlayFor, parseClassId, parseSkill } from "~/layouts/analysis.server";
import { countAnalysisRequest } from "~/layouts/analysis-rate.server";
import { analysisRefusal, jsonText } from "~/layouts/analysis-response.server";
import { apiLayoutAccess } from "~/layouts/api-access.server";

/**
 * GET /api/layouts/:layoutId/analysis?class=ID&skill=novice|club|expert: a saved layout's
 * analysis at its current version with the club's track guidance. Without `class`, every class of
 * the layout (the overlay is for the first). Same permissions as the layout page, as JSON: 401
 * signed out, 403 for non-members, 404 for a missing layout or a draft (for all but directors),
 * 400 naming the parameter for an unknown class or skill, 422 over the analysis budget, 429 over
 * the account's rate, 503 with a full queue. An unchanged layout is answered from the
 * memo; `If-None-Match` with the last ETag answers 304.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { userId, layout, guidance } = await apiLayoutAccess(request, params.layoutId);
  await countAnalysisRequest(userId);
  const query = new URL(request.url).searchParams;
  try {
    const classId = parseClassId(query.get("class"), "class");
    const skill = parseSkill(query.get("skill"), "skill");
    const run = await analyseStoredLayout(layout, {
      classIds: classId ? [classId] : undefined,
      skill,
      guidance,
      owner: userId,
    });
    const etag = `"${run.entry.key.slice(0, 32)}.${layout.version}"`;
    if (request.headers.get("If-None-Match") === etag)
      return new Response(null, {
        status: 304,
        headers: { ETag: etag, "Cache-Control": "private, no-cache" },
      });
    const text = cachedBody(run.entry, `get:${layout.id}:${layout.version}`, () => {
      const overlay = overlayFor(run, classId, skill);
      return {
        layoutId: layout.id,
        version: layout.version,
        status: layout.status,
        classId: overlay.classId,
        skill,
        guidance: run.guidance,
        analysis: run.analysis,
        overlay,
      };
    });
    return await jsonText(request, text, run.hit, { ETag: etag });
  } catch (error) {
    if (error instanceof Response) throw error;
    return analysisRefusal(error);
  }
}
