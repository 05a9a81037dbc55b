import type { Route } from "./+types/build-pack-earthworks-pdf";
import { requireBuildSheet } from "~/layouts/build-pack.server";
import { earthworksPdf } from "~/layouts/build-pack-pdf.server";
import { pdfResponse } from "~/layouts/pdf-sheet.server";

/** GET /layouts/:layoutId/build/earthworks.pdf: the earthworks sheet (directors only). */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { load, sheet, stem } = await requireBuildSheet(request, params.layoutId);
  return pdfResponse(await earthworksPdf(sheet, load.club.name), `${stem}-earthworks.pdf`);
}
