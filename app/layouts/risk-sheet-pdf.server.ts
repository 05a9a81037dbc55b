/**
 * The corner-risk sheet as PDF (A4 portrait, pdf-lib on the server, decision 0713): the same
 * content in the same order as the page: heading, the plan to scale, each marshal point with its
 * stretch, what to watch, jumps and turns and warnings, the hotspots, then the cautions.
 */
import { MARSHAL_NOTE } from "~/analysis";
import { CAUTIONS_TITLE } from "~/components/cautions";
import {
  hotspotLine,
  MARSHAL_CAUTIONS,
  POINT_COLUMNS,
  pointRows,
  RISK_SHEET_TITLE,
} from "~/lib/risk-sheet-rows";
import { createPdfSheet } from "./pdf-sheet.server";
import { drawRiskPlan } from "./risk-sheet-pdf-plan.server";
import type { RiskSheet } from "./risk-sheet.server";

/** The sheet as PDF bytes. */
export async function riskPdf(sheet: RiskSheet, made = new Date()): Promise<Uint8Array> {
  const pdf = await createPdfSheet({
    title: `${RISK_SHEET_TITLE}: ${sheet.layout.name}`,
    footer: `${RISK_SHEET_TITLE} · ${sheet.layout.name} · ${sheet.versionLabel} · ${sheet.classLabel}`,
  });
  pdf.paragraph(
    `${sheet.club.name} · ${sheet.versionLabel} · race date ${sheet.raceDate} · ${sheet.classLabel}`,
    { bold: true },
  );
  pdf.paragraph(`Made ${made.toISOString().slice(0, 10)} by Loftline.`, { grey: true });
  pdf.heading("The plan", 11);
  pdf.paragraph(
    "Hatched wedges with a dashed outline: overshoot zones beyond landings (J) and run-off zones past turns (T). " +
      "Triangles: hotspots (H). Diamonds: marshal points (M). Black squares: jump lips.",
    { grey: true },
  );
  pdf.box(400, (page, box) => drawRiskPlan(page, box, sheet, pdf.font, pdf.bold), 300);

  pdf.heading("Marshal points", 11);
  const rows = pointRows(sheet.plan);
  if (!rows.length)
    pdf.paragraph(
      "This version has no marshal points. The race director places them in the editor and publishes the layout again.",
    );
  for (const row of rows) {
    pdf.heading(row.point, 10);
    for (const c of POINT_COLUMNS.slice(1)) pdf.paragraph(`${c.title}: ${row[c.id]}`, { size: 8.5 });
  }
  pdf.heading("Hotspots", 11);
  if (!sheet.plan.hotspots.length) pdf.paragraph("No hotspot found for this class.");
  for (const h of sheet.plan.hotspots) pdf.paragraph(hotspotLine(h), { bullet: true, size: 8.5 });
  pdf.heading(CAUTIONS_TITLE, 11);
  for (const line of MARSHAL_CAUTIONS) pdf.paragraph(line, { bullet: true });
  pdf.paragraph(MARSHAL_NOTE, { grey: true, size: 8 });
  return pdf.save();
}
