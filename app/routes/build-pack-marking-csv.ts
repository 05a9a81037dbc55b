import type { Route } from "./+types/build-pack-marking-csv";
import { requireBuildSheet } from "~/layouts/build-pack.server";
import { markingCsv } from "~/layouts/build-pack-csv.server";

/** GET /layouts/:layoutId/build/marking.csv: the stakes for a surveying instrument or GNSS rover. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { sheet, stem } = await requireBuildSheet(request, params.layoutId);
  return new Response(markingCsv(sheet), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8; header=present",
      "Content-Disposition": `attachment; filename="${stem}-marking-out.csv"`,
      "Cache-Control": "private, no-cache",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
