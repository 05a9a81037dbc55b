/**
 * The build pack's two PDFs: the marking-out sheet (A4 landscape: datums, method, conventions,
 * the plan, the turns, the jumps' points and the stations) and the earthworks sheet (A4
 * portrait: earth per jump and in total). Both carry the building and the track-side cautions.
 */
import { SAFETY_CAUTIONS } from "~/components/cautions";
import { bearingDeg, metres } from "~/lib/build-pack-format";
import {
  BEARING_CONVENTION,
  BUILDING_CAUTIONS,
  closureWarning,
  EARTH_CAPTION,
  EARTH_MODEL,
  EARTHWORKS_TITLE,
  HEIGHT_CONVENTION,
  JUMPS_CAPTION,
  LOADS_NOTE,
  MARKING_TITLE,
  OFFSET_CONVENTION,
  markingMethod,
  stationsCaption,
  TURNS_CAPTION,
} from "~/lib/build-pack-words";
import { drawPlan } from "./build-pack-pdf-plan.server";
import {
  datumLines,
  earthCells,
  earthColumns,
  earthSettingsLine,
  earthTotalLine,
  stakeCells,
  stakeColumns,
  turnCells,
  turnColumns,
  type SheetColumn,
} from "~/lib/build-pack-rows";
import type { BuildSheet } from "./build-pack-sheet.server";
import { createPdfSheet, type Column, type PdfSheet } from "./pdf-sheet.server";

const asPdf = (c: SheetColumn): Column => ({
  title: c.title,
  width: c.width,
  align: c.right ? "right" : "left",
});

/** Text shared by both sheets' first lines. */
function intro(sheet: BuildSheet, clubName: string, made: Date): string {
  return `${clubName} · ${sheet.versionLabel} · made ${made.toISOString().slice(0, 10)} by Loftline`;
}

function cautions(pdf: PdfSheet) {
  pdf.heading("Building safely", 11);
  for (const line of BUILDING_CAUTIONS) pdf.paragraph(line, { bullet: true });
  pdf.heading("Safety around the track", 11);
  for (const line of SAFETY_CAUTIONS) pdf.paragraph(line, { bullet: true });
}

/** The marking-out sheet as PDF bytes. */
export async function markingPdf(
  sheet: BuildSheet,
  clubName: string,
  made = new Date(),
): Promise<Uint8Array> {
  const pdf = await createPdfSheet({
    title: `${MARKING_TITLE}: ${sheet.layoutName}`,
    footer: `${MARKING_TITLE} · ${sheet.layoutName} · ${sheet.versionLabel}`,
    orientation: "landscape",
  });
  pdf.paragraph(intro(sheet, clubName, made), { grey: true });
  pdf.heading("Datum stakes", 11);
  for (const line of datumLines(sheet)) pdf.paragraph(line);
  for (const line of markingMethod(bearingDeg(sheet.baseline.bearing), metres(sheet.baseline.length)))
    pdf.paragraph(line, { bullet: true });
  pdf.paragraph(BEARING_CONVENTION, { grey: true });
  pdf.paragraph(OFFSET_CONVENTION, { grey: true });
  pdf.paragraph(HEIGHT_CONVENTION, { grey: true });
  if (sheet.closureGap > 0.01) {
    pdf.paragraph(closureWarning(metres(sheet.closureGap)), { bold: true });
  }
  pdf.box(360, (page, box) => drawPlan(page, box, sheet, pdf.font, pdf.bold), 220);

  const geo = sheet.settings.geo !== null;
  const cols = stakeColumns(geo);
  pdf.heading(TURNS_CAPTION, 11);
  pdf.table(turnColumns.map(asPdf), sheet.turns.map(turnCells));
  pdf.heading(JUMPS_CAPTION, 11);
  pdf.table(
    cols.map(asPdf),
    sheet.jumps.flatMap((j) => j.points.map((p) => stakeCells(p, geo))),
  );
  pdf.heading(stationsCaption(String(sheet.settings.spacing)), 11);
  pdf.table(
    cols.map(asPdf),
    sheet.stations.map((p) => stakeCells(p, geo)),
  );
  cautions(pdf);
  return pdf.save();
}

/** The earthworks sheet as PDF bytes. */
export async function earthworksPdf(
  sheet: BuildSheet,
  clubName: string,
  made = new Date(),
): Promise<Uint8Array> {
  const { earth } = sheet;
  const pdf = await createPdfSheet({
    title: `${EARTHWORKS_TITLE}: ${sheet.layoutName}`,
    footer: `${EARTHWORKS_TITLE} · ${sheet.layoutName} · ${sheet.versionLabel}`,
  });
  pdf.paragraph(intro(sheet, clubName, made), { grey: true });
  pdf.paragraph(earthSettingsLine(earth));
  pdf.paragraph(EARTH_MODEL, { grey: true });
  pdf.heading(EARTH_CAPTION, 11);
  pdf.table(earthColumns.map(asPdf), earthCells(earth.rows, earth), 8);
  pdf.paragraph(earthTotalLine(earth), { bold: true });
  pdf.paragraph(LOADS_NOTE, { grey: true });
  cautions(pdf);
  return pdf.save();
}
