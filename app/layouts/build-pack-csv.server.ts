/**
 * The marking-out points as CSV for a surveying instrument or a GNSS rover: one header row, one
 * row a stake. The first five columns are the usual point, easting, northing, height,
 * description order; easting and northing are local plan metres from datum A (x and y of the
 * plan less A's), so an instrument set up on A with B as backsight can use them directly.
 * Latitude and longitude (WGS84) are filled in when datum A's are given.
 */
import { stringify } from "csv-stringify/sync";
import { bearingDeg, bearingDms, latLon, metres } from "~/lib/build-pack-format";
import { allStakes, type BuildSheet } from "./build-pack-sheet.server";

export const MARKING_CSV_COLUMNS = [
  "point",
  "easting_m",
  "northing_m",
  "height_m",
  "description",
  "kind",
  "lap_distance_m",
  "distance_from_a_m",
  "bearing_from_a_deg",
  "bearing_from_a_dms",
  "along_a_to_b_m",
  "offset_right_m",
  "latitude_deg",
  "longitude_deg",
] as const;

/** The CSV text (UTF-8, CRLF line ends as RFC 4180 has them). */
export function markingCsv(sheet: BuildSheet): string {
  const a = sheet.settings.a;
  const rows = allStakes(sheet).map((p) => [
    p.id,
    metres(p.x - a.x),
    metres(p.y - a.y),
    metres(p.height),
    p.context ? `${p.what}, ${p.context}` : p.what,
    p.kind,
    p.s === null ? "" : metres(p.s),
    metres(p.distance),
    bearingDeg(p.bearing),
    bearingDms(p.bearing),
    metres(p.along),
    metres(p.offset),
    p.lat === null ? "" : latLon(p.lat),
    p.lon === null ? "" : latLon(p.lon),
  ]);
  return stringify([[...MARKING_CSV_COLUMNS], ...rows], { record_delimiter: "windows" });
}
