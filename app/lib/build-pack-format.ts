/**
 * Number formats of the build pack, shared by the page, the PDFs and the CSV so that all three
 * print the same figures: metres to the millimetre, bearings to 0.0001 degree (under 2 mm at
 * 100 m), latitude and longitude to 1e-8 degree (about 1 mm).
 */

function fixed(v: number, places: number): string {
  const s = v.toFixed(places);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** Metres, 3 decimals. */
export const metres = (v: number) => fixed(v, 3);
/** Decimal degrees of a bearing, 4 decimals, 0 <= b < 360. */
export const bearingDeg = (v: number) => {
  const s = fixed(v, 4);
  return s === "360.0000" ? "0.0000" : s;
};
/** Latitude or longitude, 8 decimals. */
export const latLon = (v: number) => fixed(v, 8);
/** Square metres and cubic metres, 2 decimals. */
export const area = (v: number) => fixed(v, 2);
export const volume = (v: number) => fixed(v, 2);
/** Plain degrees of an angle (a turn's angle), at most 1 decimal. */
export const angleDeg = (v: number) => String(Math.round(v * 10) / 10);

/** Degrees, minutes and seconds of a bearing to 0.1", e.g. 123°27'24.1". */
export function bearingDms(deg: number): string {
  let tenths = Math.round((((deg % 360) + 360) % 360) * 36000);
  if (tenths >= 360 * 36000) tenths = 0;
  const d = Math.floor(tenths / 36000);
  const m = Math.floor((tenths % 36000) / 600);
  const s = (tenths % 600) / 10;
  return `${d}°${String(m).padStart(2, "0")}'${s.toFixed(1).padStart(4, "0")}"`;
}
