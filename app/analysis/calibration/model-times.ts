/**
 * The lap model's times for calibration: the whole lap and its sectors. Sectors are equal parts of
 * the lap by distance along the centre line, counted from the start (docs/decisions/0120).
 */
import type { LayoutDocument } from "../format/layout-document";
import { layoutGeometry, type LayoutGeometry } from "../track/geometry";
import { lapSpeed, type LapCar } from "../track/speed";

/** A layout made ready for repeated lap-time evaluation (its centre line sampled once). */
export interface CalibrationTrack {
  geometry: LayoutGeometry;
  /** Lap length along the centre line, m. */
  lapLength: number;
}

/** The modelled lap time and its sector times, s. */
export interface ModelTimes {
  lapTime: number;
  /** One time per sector (equal parts of the lap by distance), s; they add up to lapTime. */
  sectorTimes: number[];
}

/** Samples the layout's centre line once (spacing 0.1 m, as the layout analysis does). */
export function calibrationTrack(doc: Pick<LayoutDocument, "start" | "sections">): CalibrationTrack {
  const geometry = layoutGeometry(doc, 0.1);
  return { geometry, lapLength: geometry.lapLength };
}

/**
 * Lap and sector times of the lap speed model (track/speed.ts) for one car.
 * @param sectors number of equal sectors by distance (1: the whole lap only).
 */
export function modelTimes(track: CalibrationTrack, car: LapCar, sectors = 1): ModelTimes {
  if (!Number.isInteger(sectors) || sectors < 1) throw new RangeError("sectors: must be a whole number ≥ 1");
  const { line } = track.geometry;
  const lap = lapSpeed(track.geometry, car);
  const out = new Array<number>(sectors).fill(0);
  const part = line.length / sectors;
  let lapTime = 0;
  for (let i = 0; i < line.count - 1; i++) {
    const ds = line.s[i + 1] - line.s[i];
    const dt = ds / Math.max(1e-3, 0.5 * (lap.speed[i] + lap.speed[i + 1]));
    const mid = 0.5 * (line.s[i] + line.s[i + 1]);
    out[Math.min(sectors - 1, Math.floor(mid / part))] += dt;
    lapTime += dt;
  }
  return { lapTime, sectorTimes: out };
}
