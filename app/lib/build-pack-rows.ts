/**
 * The build pack's tables as columns and formatted cells, one definition for the page and the
 * PDF so both print the same headings and figures.
 */
import type { StakeKind } from "~/analysis";
import { angleDeg, area, bearingDeg, latLon, metres, volume } from "./build-pack-format";

/** A stake as the sheets list it: plan metres, bearing in degrees clockwise from grid north. */
export type StakeRow = {
  id: string;
  kind: StakeKind;
  what: string;
  /** Which turn or jump it belongs to ("J2 First double"), or "". */
  context: string;
  /** Lap distance, m. */
  s: number | null;
  height: number;
  x: number;
  y: number;
  distance: number;
  bearing: number;
  along: number;
  offset: number;
  lat: number | null;
  lon: number | null;
};

export type TurnRow = {
  number: number;
  name: string;
  direction: "left" | "right";
  angle: number;
  radius: number;
  innerRadius: number;
  outerRadius: number;
  startS: number;
  endS: number;
  centre: StakeRow;
};

/** A column: its heading, right-aligned numbers, width on the PDF in points. */
export type SheetColumn = { title: string; right?: boolean; width: number };

/** Columns of a stake table (jump points and stations), with latitude and longitude on request. */
export function stakeColumns(geo: boolean): SheetColumn[] {
  return [
    { title: "Stake", width: 52 },
    { title: "What", width: geo ? 118 : 150 },
    { title: "Lap (m)", width: 48, right: true },
    { title: "Height (m)", width: 48, right: true },
    { title: "Distance from A (m)", width: 80, right: true },
    { title: "Bearing from A (°)", width: 76, right: true },
    { title: "Along A-B (m)", width: 62, right: true },
    { title: "Offset (m)", width: 56, right: true },
    ...(geo
      ? [
          { title: "Latitude (°)", width: 70, right: true },
          { title: "Longitude (°)", width: 74, right: true },
        ]
      : []),
  ];
}

export function stakeCells(p: StakeRow, geo: boolean): string[] {
  return [
    p.id,
    p.context ? `${p.what}, ${p.context}` : p.what,
    p.s === null ? "" : metres(p.s),
    metres(p.height),
    metres(p.distance),
    bearingDeg(p.bearing),
    metres(p.along),
    metres(p.offset),
    ...(geo ? [p.lat === null ? "" : latLon(p.lat), p.lon === null ? "" : latLon(p.lon)] : []),
  ];
}

export const turnColumns: SheetColumn[] = [
  { title: "Turn", width: 120 },
  { title: "Centre stake", width: 50 },
  { title: "Distance from A (m)", width: 76, right: true },
  { title: "Bearing from A (°)", width: 72, right: true },
  { title: "Along A-B (m)", width: 58, right: true },
  { title: "Offset (m)", width: 50, right: true },
  { title: "Radius (m)", width: 48, right: true },
  { title: "Inner edge (m)", width: 58, right: true },
  { title: "Outer edge (m)", width: 58, right: true },
  { title: "Angle (°)", width: 40, right: true },
  { title: "Lap (m)", width: 70, right: true },
];

export function turnCells(t: TurnRow): string[] {
  const c = t.centre;
  return [
    `T${t.number} ${t.name} (${t.direction})`,
    c.id,
    metres(c.distance),
    bearingDeg(c.bearing),
    metres(c.along),
    metres(c.offset),
    metres(t.radius),
    metres(t.innerRadius),
    metres(t.outerRadius),
    angleDeg(t.angle),
    `${metres(t.startS)} to ${metres(t.endS)}`,
  ];
}

/** The datum lines at the head of the marking-out sheet. */
export function datumLines(sheet: {
  datums: StakeRow[];
  baseline: { length: number; bearing: number; trueBearing: number | null };
  gridTrueBearing: number | null;
}): string[] {
  const lines = sheet.datums.map(
    (d) =>
      `${d.what} at plan x ${metres(d.x)} m, y ${metres(d.y)} m` +
      (d.lat !== null && d.lon !== null
        ? `; latitude ${latLon(d.lat)}°, longitude ${latLon(d.lon)}° (WGS84)`
        : "") +
      ".",
  );
  const { baseline } = sheet;
  lines.push(
    `A to B: ${metres(baseline.length)} m at a bearing of ${bearingDeg(baseline.bearing)}° from grid north` +
      (baseline.trueBearing !== null
        ? ` (${bearingDeg(baseline.trueBearing)}° from true north; the plan's up lies at ${bearingDeg(sheet.gridTrueBearing ?? 0)}° true).`
        : "."),
  );
  return lines;
}

export type EarthRow = {
  number: number;
  name: string;
  kindLabel: string;
  length: number;
  maxHeight: number;
  section: number;
  fill: number;
  cut: number;
  fillLoads: number;
  cutLoads: number;
};

export type EarthTotals = { fill: number; cut: number; fillLoads: number; cutLoads: number; truck: number };

export const earthColumns: SheetColumn[] = [
  { title: "Jump", width: 100 },
  { title: "Kind", width: 55 },
  { title: "Length (m)", width: 50, right: true },
  { title: "Highest (m)", width: 52, right: true },
  { title: "Long section (m²)", width: 80, right: true },
  { title: "Fill (m³)", width: 48, right: true },
  { title: "Cut (m³)", width: 48, right: true },
  { title: "Loads in", width: 45, right: true },
  { title: "Loads out", width: 45, right: true },
];

/** One row a jump and a total row. */
export function earthCells(rows: EarthRow[], total: EarthTotals): string[][] {
  return [
    ...rows.map((r) => [
      `J${r.number} ${r.name}`,
      r.kindLabel,
      metres(r.length),
      metres(r.maxHeight),
      area(r.section),
      volume(r.fill),
      volume(r.cut),
      String(r.fillLoads),
      String(r.cutLoads),
    ]),
    [
      "Total",
      "",
      "",
      "",
      "",
      volume(total.fill),
      volume(total.cut),
      String(total.fillLoads),
      String(total.cutLoads),
    ],
  ];
}

/** The earthworks sheet's closing sentence. */
export function earthTotalLine(t: EarthTotals): string {
  return (
    `Total: ${volume(t.fill)} m³ of fill, ${t.fillLoads} loads of ${volume(t.truck)} m³` +
    (t.cut > 0 ? `; ${volume(t.cut)} m³ dug out, ${t.cutLoads} loads.` : ".")
  );
}

/** The earthworks sheet's first line. */
export function earthSettingsLine(e: { width: number; sideSlope: number; truck: number }): string {
  return `Track width ${metres(e.width)} m; side slopes at ${angleDeg(e.sideSlope)}°; a truck load is ${volume(e.truck)} m³.`;
}
