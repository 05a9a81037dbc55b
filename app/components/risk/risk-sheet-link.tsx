import { Link } from "react-router";
import { RISK_SHEET_TITLE } from "~/lib/risk-sheet-rows";

/** Where a version's corner-risk sheet is: `/layouts/:id/risk` with its version and class. */
export function riskSheetHref(layoutId: string, query: Record<string, string | undefined> = {}): string {
  const q = new URLSearchParams(
    Object.entries(query).filter((e): e is [string, string] => typeof e[1] === "string" && e[1] !== ""),
  ).toString();
  return `/layouts/${layoutId}/risk${q ? `?${q}` : ""}`;
}

/** The link to the corner-risk sheet, with a line saying what it is for. */
export function RiskSheetLink({
  layoutId,
  query,
  className = "",
}: {
  layoutId: string;
  query?: Record<string, string | undefined>;
  className?: string;
}) {
  return (
    <p className={`no-print text-sm ${className}`}>
      <Link to={riskSheetHref(layoutId, query)} className="font-medium text-pine-700 hover:underline">
        {RISK_SHEET_TITLE}
      </Link>{" "}
      <span className="text-ink-500">for marshals: where cars crash and where to stand, to print.</span>
    </p>
  );
}
