import type { Route } from "./+types/api-layout-analysis";
import { cachedBody } from "~/layouts/analysis-memo.server";
import { carParam } from "~/cars/reader-choice.server";
import { analyseStoredLayout, overlayFor, parseSkill } from "~/layouts/analysis.server";
import { countAnalysisRequest } from "~/layouts/analysis-rate.server";
import { analysisRefusal, jsonText, parseOnly } from "~/layouts/analysis-response.server";
import { apiLayoutAccess } from "~/layouts/api-access.server";
import { loadVersionDocument } from "~/layouts/documents.server";
import { apiReading } from "~/layouts/api-reading.server";

/**
 * GET /api/layouts/:layoutId/analysis?car=ID|profile:ID&skill=novice|club|expert&version=N[&only=overlay]: a
 * saved layout's analysis with the club's track guidance, at the version the caller reads (marshals
 * and drivers: the race-day version or `version=N` of a published one; directors: the working
 * draft or any saved version). `car` (or `class`) picks one car class or the caller's own car
 * profile; without it, every class of the layout (the overlay is for the first); `only=overlay`
 * leaves out `analysis` and `guidance` (what the read-only plan draws). Same permissions
 * as the layout page, as JSON: 401 signed out, 403 for non-members, 404 for a missing layout, a
 * draft or unpublished version (for all but directors) or someone else's car profile, 400 naming
 * the parameter for an unknown class, skill or version, 422 over the analysis budget, 429 over
 * the account's rate, 503 with a full queue. An unchanged layout is answered from the
 * memo; `If-None-Match` with the last ETag answers 304.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, guidance, role, userId } = await apiLayoutAccess(request, params.layoutId);
  await countAnalysisRequest(userId);
  const query = new URL(request.url).searchParams;
  try {
    const which = await apiReading(layout.id, role, query);
    const field = query.get("car") !== null ? "car" : "class";
    const { classId, own } = await carParam(userId, query.get(field), field);
    const skill = parseSkill(query.get("skill"), "skill");
    const only = parseOnly(query.get("only"), "only");
    const run = await analyseStoredLayout(layout, {
      classIds: classId ? [classId] : undefined,
      skill,
      guidance,
      owner: userId,
      cars: own ? { [own.classId]: own.car } : undefined,
      saved:
        which.kind === "draft"
          ? undefined
          : {
              number: which.number,
              load: async () => {
                const document = await loadVersionDocument(layout.id, which.number);
                if (!document)
                  throw Response.json({ error: "No such version of this layout." }, { status: 404 });
                return document;
              },
            },
    });
    const readVersion = which.kind === "draft" ? null : which.number;
    // A published version's answer does not change when the draft is saved: its tag names the version read.
    const etag = `"${run.entry.key.slice("analysis:".length)}.${readVersion === null ? layout.version : `v${readVersion}`}${only ? `.${only}` : ""}"`;
    if (request.headers.get("If-None-Match") === etag)
      return new Response(null, {
        status: 304,
        headers: { ETag: etag, "Cache-Control": "private, no-cache" },
      });
    const purpose = `get:${layout.id}:${layout.version}:${readVersion ?? "draft"}:${only ?? "all"}`;
    const text = cachedBody(run.entry, purpose, () => {
      const overlay = overlayFor(run, classId, skill);
      return {
        layoutId: layout.id,
        version: layout.version,
        readVersion,
        published: which.kind === "draft" ? null : which.publication,
        status: layout.status,
        classId: overlay.classId,
        skill,
        guidance: only ? undefined : run.guidance,
        analysis: only ? undefined : run.analysis,
        overlay,
      };
    });
    return await jsonText(request, text, run.hit, { ETag: etag });
  } catch (error) {
    if (error instanceof Response) throw error;
    return analysisRefusal(error);
  }
}
