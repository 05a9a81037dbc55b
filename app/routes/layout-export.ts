import type { Route } from "./+types/layout-export";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { readingFor } from "~/layouts/reading.server";
import { exportFileName } from "~/lib/layout-file-name";

/**
 * GET /layouts/:layoutId/export[?version=n]: the version the reader reads (marshals and drivers:
 * the race-day version; directors: the working draft) as a downloadable .json file in the
 * product's own format (docs/layout-format.md). Anyone who may open the layout page may export it.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, role } = await requireLayoutAccess(request, params.layoutId);
  const reading = await readingFor(layout, role, new URL(request.url).searchParams);
  const { document } = reading;
  const body = `${JSON.stringify(document, null, 2)}\n`;
  const name = exportFileName(document.name, reading.kind === "draft" ? layout.version : reading.number!);
  return new Response(body, {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="${name}"; filename*=UTF-8''${encodeURIComponent(name)}`,
      "Cache-Control": "private, no-cache",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
