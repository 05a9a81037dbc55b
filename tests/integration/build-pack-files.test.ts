import { parse } from "csv-parse/sync";
import { PDFDocument } from "pdf-lib";
import { beforeAll, describe, expect, it } from "vitest";
import { earthworks, markingOut, pointFromBearing, pointFromOffsets } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { metres, volume } from "~/lib/build-pack-format";
import { loader as csvLoader } from "~/routes/build-pack-marking-csv";
import { loader as earthLoader } from "~/routes/build-pack-earthworks-pdf";
import { loader as pdfLoader } from "~/routes/build-pack-marking-pdf";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { pdfText } from "./helpers/pdf-text";
import { args, getRequest } from "./helpers/requests";

useTestDatabase();

const DEG = Math.PI / 180;
let cookie = "";
let layoutId = "";

beforeAll(async () => {
  const { club, director } = await makeClubWithRoles();
  cookie = director.cookie;
  layoutId = (await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id)).id;
});

type Loader = (args: never) => Promise<Response>;
async function fetchFile(loader: Loader, file: string, query: string): Promise<Response> {
  const request = getRequest(`/layouts/${layoutId}/build/${file}?${query}`, cookie);
  return (await loader(args(request, { layoutId }))) as Response;
}

/** WGS84 (NIMA TR8350.2): a = 6378137 m, f = 1/298.257223563. */
const A = 6378137;
const E2 = (1 / 298.257223563) * (2 - 1 / 298.257223563);

/**
 * A small step north and east from a latitude, in degrees, with the meridian and prime-vertical
 * radii of curvature M = a(1 - e²)/(1 - e² sin²φ)^1.5 and N = a/(1 - e² sin²φ)^0.5 (standard
 * geodesy textbook formulas); good to well under a millimetre over the 60 m of a site.
 */
function stepDegrees(latDeg: number, north: number, east: number) {
  const s2 = Math.sin(latDeg * DEG) ** 2;
  const M = (A * (1 - E2)) / (1 - E2 * s2) ** 1.5;
  const N = A / Math.sqrt(1 - E2 * s2);
  return { dLat: north / M / DEG, dLon: east / (N * Math.cos(latDeg * DEG)) / DEG };
}

describe("build pack files", () => {
  it("prints a name the PDF font cannot show with its plain letters and question marks", async () => {
    const { club, director } = await makeClubWithRoles();
    const named = await createLayoutFromDocument(
      club.id,
      { ...SUMMER_LAYOUT, name: "Été 🏁 Ридж" },
      director.id,
    );
    const request = getRequest(`/layouts/${named.id}/build/earthworks.pdf`, director.cookie);
    const res = (await earthLoader(args(request, { layoutId: named.id }))) as Response;
    expect(res.status).toBe(200);
    expect(res.headers.get("Content-Disposition")).toBe('attachment; filename="ete-v1-earthworks.pdf"');
    expect(pdfText(new Uint8Array(await res.arrayBuffer()))).toContain("Earthworks sheet: Été ? ????");
  });

  it("marking.pdf is a PDF whose text carries the datums, the stakes with the engine's figures and the cautions", async () => {
    const res = await fetchFile(pdfLoader, "marking.pdf", "a=stand&b=corner-3&spacing=5");
    expect(res.status).toBe(200);
    expect(res.headers.get("Content-Type")).toBe("application/pdf");
    expect(res.headers.get("Content-Disposition")).toBe(
      'attachment; filename="summer-layout-v1-marking-out.pdf"',
    );
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    expect((await PDFDocument.load(bytes)).getPageCount()).toBeGreaterThan(2);
    const text = pdfText(bytes);
    for (const words of [
      "Marking-out sheet: Summer layout",
      "Datum A: Driver stand at plan x 30.000 m, y -3.000 m",
      "Datum B: Site boundary corner 3 at plan x 60.000 m, y 38.000 m",
      "clockwise from grid north",
      "positive to the right looking from A to B",
      "Turns: set out from the centre",
      "Building safely",
      "local codes",
      "Safety around the track",
    ])
      expect(text).toContain(words);
    const sheet = markingOut(SUMMER_LAYOUT, { x: 30, y: -3 }, { x: 60, y: 38 }, 5);
    const lip = sheet.jumps[0].points.find((p) => p.kind === "jump-lip")!;
    const row = text.split("\n").find((l) => l.trim().startsWith("J1-LIP"));
    expect(row).toBeDefined();
    expect(row).toContain(metres(lip.measure.distance));
    expect(row).toContain(metres(lip.measure.offset));
    expect(text).toMatch(new RegExp(`\\bC${sheet.stations.length}\\b`));
  });

  it("earthworks.pdf lists every jump's earth and the total in loads, with the building cautions", async () => {
    const res = await fetchFile(earthLoader, "earthworks.pdf", "truck=4");
    expect(res.status).toBe(200);
    expect(res.headers.get("Content-Disposition")).toBe(
      'attachment; filename="summer-layout-v1-earthworks.pdf"',
    );
    const text = pdfText(new Uint8Array(await res.arrayBuffer()));
    const earth = earthworks(SUMMER_LAYOUT, 4);
    expect(text).toContain("Earthworks sheet: Summer layout");
    for (const j of earth.jumps)
      expect(text).toMatch(new RegExp(`J${j.number} .*${volume(j.fill).replace(".", "\\.")}`));
    expect(text).toContain(`Total: ${volume(earth.fill)} m³ of fill, ${earth.fillLoads} loads of 4.00 m³`);
    expect(text).toContain("compacted");
    expect(text).toContain("local codes");
  });

  it("marking.csv has one row a stake, rebuilding each centre-line stake within 1 cm both ways", async () => {
    const res = await fetchFile(csvLoader, "marking.csv", "a=stand&b=corner-3&spacing=4");
    expect(res.status).toBe(200);
    expect(res.headers.get("Content-Type")).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers.get("Content-Disposition")).toBe(
      'attachment; filename="summer-layout-v1-marking-out.csv"',
    );
    const rows: Record<string, string>[] = parse(await res.text(), { columns: true });
    const sheet = markingOut(SUMMER_LAYOUT, { x: 30, y: -3 }, { x: 60, y: 38 }, 4);
    const points = sheet.jumps.reduce((t, j) => t + j.points.length, 0);
    expect(rows).toHaveLength(2 + sheet.turns.length + points + 3 * sheet.stations.length);
    expect(rows[0]).toMatchObject({ point: "A", easting_m: "0.000", northing_m: "0.000", latitude_deg: "" });
    const base = sheet.baseline;
    for (const st of sheet.stations) {
      const row = rows.find((r) => r.point === st.centre.id)!;
      const byBearing = pointFromBearing(
        base.a,
        Number(row.distance_from_a_m),
        Number(row.bearing_from_a_deg) * DEG,
      );
      const byOffsets = pointFromOffsets(base, Number(row.along_a_to_b_m), Number(row.offset_right_m));
      for (const p of [byBearing, byOffsets])
        expect(Math.hypot(p.x - st.centre.x, p.y - st.centre.y)).toBeLessThan(0.01);
      expect(Number(row.easting_m) + 30).toBeCloseTo(st.centre.x, 3);
    }
  });

  it("adds WGS84 latitude and longitude from datum A's and the plan's true bearing (proj4)", async () => {
    // The plan's up lies at true north: B (30 m east, 41 m north of A) is a plain step.
    const grid = await fetchFile(
      csvLoader,
      "marking.csv",
      "a=stand&b=corner-3&lat=52.1&lon=-1.2&orient=grid&trueBearing=0",
    );
    const rows: Record<string, string>[] = parse(await grid.text(), { columns: true });
    const b = rows.find((r) => r.point === "B")!;
    const step = stepDegrees(52.1, 41, 30);
    expect(Number(rows[0].latitude_deg)).toBeCloseTo(52.1, 8);
    expect(Number(b.latitude_deg)).toBeCloseTo(52.1 + step.dLat, 7); // 1e-7 degree is about 1 cm
    expect(Number(b.longitude_deg)).toBeCloseTo(-1.2 + step.dLon, 7);
    // A to B measured on site at 90 degrees true: B lies due east of A, 50.804 m away.
    const ab = await fetchFile(
      csvLoader,
      "marking.csv",
      "a=stand&b=corner-3&lat=52.1&lon=-1.2&orient=ab&trueBearing=90",
    );
    const b2 = (parse(await ab.text(), { columns: true }) as Record<string, string>[]).find(
      (r) => r.point === "B",
    )!;
    const east = stepDegrees(52.1, 0, Math.hypot(30, 41));
    expect(Number(b2.latitude_deg)).toBeCloseTo(52.1, 7);
    expect(Number(b2.longitude_deg)).toBeCloseTo(-1.2 + east.dLon, 7);
  });
});
