/**
 * Latitude and longitude of the stakes (WGS84) from datum A's latitude and longitude and how the
 * plan lies on the ground, through proj4: an azimuthal equidistant projection centred on A keeps
 * every distance and true bearing from A exact, which is how the stakes are measured.
 */
import proj4 from "proj4";
import { trueBearing, type Baseline, type DatumMeasure } from "~/analysis";

const RAD = Math.PI / 180;

export type GeoSetting = { lat: number; lon: number; orient: "grid" | "ab"; trueBearing: number };

export type GeoStake = { lat: number; lon: number; trueBearingDeg: number };

/**
 * A function giving each stake's WGS84 position (degrees) and its true bearing from A (degrees
 * clockwise from true north), and the true bearing of the plan's up direction.
 */
export function geoLocator(line: Baseline, geo: GeoSetting) {
  const orientation =
    geo.orient === "grid"
      ? { gridTrueBearing: geo.trueBearing * RAD }
      : { abTrueBearing: geo.trueBearing * RAD };
  const projection = proj4(
    `+proj=aeqd +lat_0=${geo.lat} +lon_0=${geo.lon} +x_0=0 +y_0=0 +ellps=WGS84 +datum=WGS84 +units=m +no_defs`,
    "WGS84",
  );
  const gridTrueBearingDeg = trueBearing(0, line, orientation) / RAD;
  const locate = (m: DatumMeasure): GeoStake => {
    const t = trueBearing(m.bearing, line, orientation);
    const [lon, lat] = projection.forward([m.distance * Math.sin(t), m.distance * Math.cos(t)]);
    return { lat, lon, trueBearingDeg: t / RAD };
  };
  return { locate, gridTrueBearingDeg };
}
