import type { Route } from "./+types/build-pack-marking-pdf";
import { requireBuildSheet } from "~/layouts/build-pack.server";
import { markingPdf } from "~/layouts/build-pack-pdf.server";
import { pdfResponse } from "~/layouts/pdf-sheet.server";

/** GET /layouts/:layoutId/build/marking.pdf: the marking-out sheet (directors only; the page's settings). */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { load, sheet, stem } = await requireBuildSheet(request, params.layoutId);
  return pdfResponse(await markingPdf(sheet, load.club.name), `${stem}-marking-out.pdf`);
}
