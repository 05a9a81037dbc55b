import type { Route } from "./+types/api-marshal-plan";
import { editorMarshalPlan } from "~/layouts/marshal-plan-api.server";

/** Only POST has a meaning here. */
export function loader(_: Route.LoaderArgs) {
  return Response.json(
    { error: "Send the draft layout document with POST: { document, suggest? }." },
    { status: 405, headers: { Allow: "POST" } },
  );
}

/**
 * POST /api/layouts/:layoutId/marshal-plan: the editor's marshal point warnings and, with
 * `suggest: true`, a suggested set of points for the draft `document` (directors only; 401, 403,
 * 404 as JSON; a bad document 400 naming its fields; at most 1 MB, 413 beyond).
 */
export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return loader({} as Route.LoaderArgs);
  return editorMarshalPlan(request, params.layoutId);
}
