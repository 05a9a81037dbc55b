import type { Route } from "./+types/risk-sheet-pdf";
import { pdfResponse } from "~/layouts/pdf-sheet.server";
import { riskPdf } from "~/layouts/risk-sheet-pdf.server";
import { loadRiskSheet, riskFileName } from "~/layouts/risk-sheet.server";

/** GET /layouts/:layoutId/risk.pdf?class=<id>&version=n: the corner-risk sheet as PDF (pdf-lib). */
export async function loader({ request, params }: Route.LoaderArgs) {
  const sheet = await loadRiskSheet(request, params.layoutId);
  return pdfResponse(await riskPdf(sheet), riskFileName(sheet));
}
