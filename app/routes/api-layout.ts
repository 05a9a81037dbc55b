import type { Route } from "./+types/api-layout";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { loadLayoutDocument } from "~/layouts/documents.server";

/**
 * GET /api/layouts/:layoutId: the layout's latest document in the product's own format, with its
 * version. Same permissions as the layout page, answered as JSON: 401 signed out, 403 for
 * non-members, 404 for a missing layout (or a draft, for anyone but a director).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout } = await requireLayoutAccess(request, params.layoutId, "member", { api: true });
  const { document, versionNumber } = await loadLayoutDocument(layout);
  return Response.json(
    {
      layoutId: layout.id,
      clubId: layout.clubId,
      status: layout.status,
      /** The layout's version counter (every save or change adds one). */
      version: layout.version,
      /** Number of the stored document version, null while nothing has been drawn. */
      documentVersion: versionNumber,
      document,
    },
    { headers: { "Cache-Control": "private, no-cache" } },
  );
}
