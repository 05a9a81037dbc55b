import type { Route } from "./+types/layout-export";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { loadLayoutDocument } from "~/layouts/documents.server";
import { exportFileName } from "~/lib/layout-file-name";

/**
 * GET /layouts/:layoutId/export: the layout's latest document as a downloadable .json file in the
 * product's own format (docs/layout-format.md). Anyone who may open the layout page may export it.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout } = await requireLayoutAccess(request, params.layoutId);
  const { document } = await loadLayoutDocument(layout);
  const body = `${JSON.stringify(document, null, 2)}\n`;
  const name = exportFileName(document.name, layout.version);
  return new Response(body, {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="${name}"; filename*=UTF-8''${encodeURIComponent(name)}`,
      "Cache-Control": "private, no-cache",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
