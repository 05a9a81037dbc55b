import type { Route } from "./+types/api-analysis";
import { requireLayoutAccess, requireUser } from "~/auth/permissions.server";
import { cachedBody } from "~/layouts/analysis-memo.server";
import type { ClubGuidance } from "~/clubs/guidance.server";
import { loadClubGuidance } from "~/clubs/guidance.server";
import { carParam } from "~/cars/reader-choice.server";
import { analyseDocument, overlayFor, parseSkill } from "~/layouts/analysis.server";
import { countAnalysisRequest } from "~/layouts/analysis-rate.server";
import { analysisRefusal, badRequest, jsonText, parseOnly } from "~/layouts/analysis-response.server";
import { ONE_MEGABYTE, readJsonBody } from "~/lib/json-body.server";
import { parseLayoutDocument } from "~/analysis";

/** Only POST has a meaning here. */
export function loader(_: Route.LoaderArgs) {
  return Response.json(
    { error: "Send a layout document with POST: { document, classId? or car?, skill?, layoutId?, only? }." },
    { status: 405, headers: { Allow: "POST" } },
  );
}

/**
 * POST /api/analysis: the analysis of a draft layout document, nothing saved (the editor calls it
 * while a director drags). Body `{ document, classId?, car?, skill?, layoutId? }`, at most 1 MB
 * (413 beyond); `car` is a class id or "profile:<id>" of the caller's own car profile (404 for
 * anyone else's). Answers `{ analysis, overlay }`: every class of the document, or only that car; the
 * overlay for `classId` or the first class; with `only: "overlay"`, `{ overlay }` alone (what the
 * editor draws). With `layoutId` (a layout the user may open) the
 * club's track guidance applies, otherwise the document's own set. Signed-in users only (401);
 * a bad document or field answers 400 with `{ error, issues: [{ path, message }] }`; over the
 * work budget 422 naming the limit; too many requests of the account 429; a full queue 503.
 */
export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return loader({} as Route.LoaderArgs);
  const user = await requireUser(request, { api: true });
  await countAnalysisRequest(user.id);
  const body = await readJsonBody(request, ONE_MEGABYTE);
  if (typeof body !== "object" || body === null || Array.isArray(body))
    return badRequest([{ path: "(body)", message: "must be a JSON object { document, classId?, skill? }" }]);
  const input = body as Record<string, unknown>;
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
    const field = input.car !== undefined ? "car" : "classId";
    const { classId, own } = await carParam(user.id, input[field], field);
    const skill = parseSkill(input.skill, "skill");
    const only = parseOnly(input.only, "only");
    let guidance: ClubGuidance | undefined;
    if (input.layoutId !== undefined) {
      if (typeof input.layoutId !== "string")
        return badRequest([{ path: "layoutId", message: "must be a layout id" }]);
      const { layout } = await requireLayoutAccess(request, input.layoutId, "member", { api: true });
      guidance = await loadClubGuidance(layout.clubId);
    }
    const run = await analyseDocument(parsed.document, {
      classIds: classId ? [classId] : undefined,
      skill,
      guidance,
      fieldPrefix: "document.",
      owner: user.id,
      cars: own ? { [own.classId]: own.car } : undefined,
    });
    const text = cachedBody(run.entry, `post:${only ?? "all"}`, () => ({
      analysis: only === "overlay" ? undefined : run.analysis,
      overlay: overlayFor(run, classId, skill),
    }));
    return await jsonText(request, text, run.hit);
  } catch (error) {
    if (error instanceof Response) throw error;
    return analysisRefusal(error, "document.");
  }
}
