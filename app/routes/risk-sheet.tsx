import type { Route } from "./+types/risk-sheet";
import { RiskSheetView } from "~/components/risk/risk-sheet-view";
import { RISK_SHEET_TITLE } from "~/lib/risk-sheet-rows";
import { loadRiskSheet } from "~/layouts/risk-sheet.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${RISK_SHEET_TITLE}: ${data?.sheet.layout.name ?? "layout"} · Loftline` },
];

/**
 * GET /layouts/:layoutId/risk?class=<id>&version=n: the corner-risk sheet of a version for one car
 * class, for every member of the club (marshals and drivers: published versions only).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  return { sheet: await loadRiskSheet(request, params.layoutId) };
}

export default function RiskSheetPage({ loaderData }: Route.ComponentProps) {
  return <RiskSheetView sheet={loaderData.sheet} />;
}
