import { Form, Link } from "react-router";
import { MARSHAL_NOTE, type AnalysisOverlay, type LayoutDocument, type MarshalPlan } from "~/analysis";
import { CAUTIONS_TITLE } from "~/components/cautions";
import { TrackDrawing } from "~/components/drawing/track-drawing";
import { buttonClass } from "~/components/ui/button";
import { hotspotLine, MARSHAL_CAUTIONS, RISK_SHEET_TITLE } from "~/lib/risk-sheet-rows";
import { PointTable } from "./point-table";
import { hotspotLabels, riskLayers, zoneExtent } from "./risk-layers";

export type RiskSheetData = {
  club: { id: string; name: string };
  layout: { id: string; name: string };
  versionLabel: string;
  raceDate: string;
  classId: string;
  classLabel: string;
  classes: { classId: string; label: string }[];
  query: Record<string, string>;
  site: Pick<LayoutDocument, "driverStand" | "marshalPoints" | "siteBoundary" | "trackWidth">;
  overlay: AnalysisOverlay;
  plan: MarshalPlan;
};

const qs = (q: Record<string, string>) => {
  const s = new URLSearchParams(q).toString();
  return s ? `?${s}` : "";
};

/** The corner-risk sheet: heading, plan, marshal points, hotspots, cautions (decision 0712). */
export function RiskSheetView({ sheet }: { sheet: RiskSheetData }) {
  const { layout, plan, query } = sheet;
  const versionQuery = Object.fromEntries(Object.entries(query).filter(([k]) => k === "version"));
  const numbers = Object.fromEntries(plan.jumps.map((j) => [j.sectionId, Number(j.id.slice(1))]));
  const names = Object.fromEntries(plan.jumps.map((j) => [j.sectionId, j.title]));
  return (
    <article className="space-y-6">
      <header className="print-keep space-y-1">
        <p className="text-sm" data-print="hide">
          <Link to={`/clubs/${sheet.club.id}`} className="text-pine-700 hover:underline">
            {sheet.club.name}
          </Link>
          {" · "}
          <Link to={`/layouts/${layout.id}${qs(versionQuery)}`} className="text-pine-700 hover:underline">
            Layout page
          </Link>
        </p>
        <h1 className="text-2xl font-semibold break-words">
          {RISK_SHEET_TITLE}: {layout.name}
        </h1>
        <p className="text-sm text-ink-700">
          {sheet.club.name} · {sheet.versionLabel} · race date {sheet.raceDate} · {sheet.classLabel}
        </p>
      </header>
      <div className="no-print flex flex-wrap items-end gap-3">
        {sheet.classes.length > 1 ? (
          <Form method="get" className="flex items-end gap-2">
            {versionQuery.version ? (
              <input type="hidden" name="version" value={versionQuery.version} />
            ) : null}
            <label className="text-sm">
              <span className="block font-medium text-ink-700">Car class</span>
              <select
                name="class"
                defaultValue={sheet.classId}
                className="rounded-md border border-ink-300 px-2 py-1"
              >
                {sheet.classes.map((c) => (
                  <option key={c.classId} value={c.classId}>
                    {c.label}
                  </option>
                ))}
              </select>
            </label>
            <button type="submit" className={buttonClass("secondary")}>
              Show this class
            </button>
          </Form>
        ) : null}
        <a href={`/layouts/${layout.id}/risk.pdf${qs(query)}`} className={buttonClass("secondary")} download>
          Download the PDF
        </a>
      </div>
      <section aria-labelledby="plan-heading" className="space-y-2">
        <h2 id="plan-heading" className="text-lg font-semibold">
          The plan
        </h2>
        <p className="text-sm text-ink-700">
          Hatched wedges with a dashed outline: overshoot zones beyond landings (J) and run-off zones past
          turns (T). Triangles: hotspots (H). Diamonds: marshal points (M).
        </p>
        <TrackDrawing
          overlay={sheet.overlay}
          site={sheet.site}
          numbers={numbers}
          names={names}
          jumpHref={(id) => `/layouts/${layout.id}/jumps/${id}${qs(versionQuery)}`}
          title={layout.name}
          classLabel={sheet.classLabel}
          extraPoints={zoneExtent(plan.zones)}
          layers={riskLayers(plan.zones, plan.hotspots)}
          extraLabels={hotspotLabels(plan.hotspots)}
        />
      </section>
      <section aria-labelledby="points-heading" className="space-y-2">
        <h2 id="points-heading" className="text-lg font-semibold">
          Marshal points
        </h2>
        <PointTable plan={plan} />
      </section>
      <section aria-labelledby="hotspots-heading" className="space-y-2">
        <h2 id="hotspots-heading" className="text-lg font-semibold">
          Hotspots
        </h2>
        {plan.hotspots.length ? (
          <ol className="space-y-1 text-sm">
            {plan.hotspots.map((h) => (
              <li key={h.id} className="print-keep">
                <strong>{hotspotLine(h).split(" · ")[0]}</strong> ·{" "}
                {hotspotLine(h).split(" · ").slice(1).join(" · ")}
              </li>
            ))}
          </ol>
        ) : (
          <p className="text-sm text-ink-700">No hotspot found for this class.</p>
        )}
      </section>
      <aside
        aria-labelledby="sheet-cautions"
        className="print-keep rounded-lg border-2 border-clay-500 bg-clay-100/60 p-4"
      >
        <h2 id="sheet-cautions" className="text-lg font-semibold">
          {CAUTIONS_TITLE}
        </h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
          {MARSHAL_CAUTIONS.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-ink-700">{MARSHAL_NOTE}</p>
      </aside>
    </article>
  );
}
