/**
 * Earth in each jump (product item 10, the earthworks sheet).
 *
 * Volume model: the jump's ground profile h(d) (m, along the section) is a long section of the
 * mound, flat across the track width W; beyond each track edge the earth falls away to the
 * ground at the mounds' back-side angle θ (MOUND_BACK_SLOPE_DEG), so a cross-section at d is a
 * trapezoid of area W·|h| + h²/tan θ. The volume is its integral along the section:
 *
 *   V = W ∫|h| dd + (1 / tan θ) ∫ h² dd,
 *
 * exact for the piecewise-linear profile: on a piece of length L from h0 to h1 (one sign),
 * ∫|h| = L (|h0| + |h1|) / 2 and ∫h² = L (h0² + h0 h1 + h1²) / 3. Ground above the surrounding
 * level is fill (earth brought in); a free profile may dip below it, which is cut (earth dug out,
 * its sides sloping out at the same angle). The face and landing ramps are already in h(d), and
 * the side slopes shrink to nothing where they reach the ground, so no end pieces are added.
 */
import type { LayoutDocument } from "../format/layout-document";
import { MOUND_BACK_SLOPE_DEG } from "../format/layout-document-checks";
import { resolveSections } from "../track/geometry";

/** Side slope of the earth beyond the track edges, rad (the mounds' back-side angle). */
export const SIDE_SLOPE = (MOUND_BACK_SLOPE_DEG * Math.PI) / 180;

/** Smallest and largest truck load accepted, m³. */
export const TRUCK_LOAD_RANGE = { min: 0.1, max: 50 } as const;

/** Volumes of one profile. */
export interface ProfileEarth {
  /** Area of the long section above / below the surrounding ground, m². */
  fillSection: number;
  cutSection: number;
  /** Volume above (fill) / below (cut) the surrounding ground, m³. */
  fill: number;
  cut: number;
}

/**
 * Earth in a piecewise-linear profile (see the module comment for the formula).
 * @param d distances along the section, m (increasing); @param h heights, m.
 * @param width track width, m; @param sideSlope angle of the side slopes, rad (0 < θ ≤ π/2).
 */
export function profileEarth(
  d: readonly number[],
  h: readonly number[],
  width: number,
  sideSlope = SIDE_SLOPE,
): ProfileEarth {
  const cot = 1 / Math.tan(sideSlope);
  const out: ProfileEarth = { fillSection: 0, cutSection: 0, fill: 0, cut: 0 };
  const add = (length: number, h0: number, h1: number) => {
    const area = (length * Math.abs(h0 + h1)) / 2;
    const squares = (length * (h0 * h0 + h0 * h1 + h1 * h1)) / 3;
    const volume = width * area + cot * squares;
    if (h0 + h1 >= 0) {
      out.fillSection += area;
      out.fill += volume;
    } else {
      out.cutSection += area;
      out.cut += volume;
    }
  };
  for (let i = 1; i < d.length; i++) {
    const L = d[i] - d[i - 1];
    const h0 = h[i - 1];
    const h1 = h[i];
    if (h0 * h1 < 0) {
      // Split where the piece crosses the ground so each part has one sign.
      const t = h0 / (h0 - h1);
      add(L * t, h0, 0);
      add(L * (1 - t), 0, h1);
    } else add(L, h0, h1);
  }
  return out;
}

/** Earth in one jump. */
export interface JumpEarth extends ProfileEarth {
  /** J1, J2, ... in track order (as on the layout page). */
  number: number;
  sectionIndex: number;
  sectionId: string;
  /** Plan length of the jump, m; its highest point above the ground, m. */
  length: number;
  maxHeight: number;
  /** Truck loads to bring in (fill) and to take away (cut), whole loads. */
  fillLoads: number;
  cutLoads: number;
}

export interface Earthworks {
  jumps: JumpEarth[];
  /** Track width, m; side slope, rad; truck load, m³. */
  width: number;
  sideSlope: number;
  truckLoad: number;
  /** Totals, m³, and whole truck loads of the totals (not the sum of each jump's loads). */
  fill: number;
  cut: number;
  fillLoads: number;
  cutLoads: number;
}

/** Whole loads that carry a volume, rounded up. @param volume m³; @param truckLoad m³. */
export function truckLoads(volume: number, truckLoad: number): number {
  return volume <= 1e-9 ? 0 : Math.ceil(volume / truckLoad - 1e-9);
}

/**
 * Earth in every jump of a layout and in total.
 * @param truckLoad volume one truck carries, m³ (TRUCK_LOAD_RANGE).
 * @throws RangeError for a truck load out of range.
 */
export function earthworks(
  doc: Pick<LayoutDocument, "start" | "sections" | "trackWidth">,
  truckLoad: number,
): Earthworks {
  if (!(truckLoad >= TRUCK_LOAD_RANGE.min && truckLoad <= TRUCK_LOAD_RANGE.max)) {
    throw new RangeError(`truck load must be between ${TRUCK_LOAD_RANGE.min} and ${TRUCK_LOAD_RANGE.max} m³`);
  }
  const jumps: JumpEarth[] = [];
  for (const sec of resolveSections(doc)) {
    if (!sec.profile) continue;
    const earth = profileEarth(sec.profile.d, sec.profile.h, doc.trackWidth);
    jumps.push({
      number: jumps.length + 1,
      sectionIndex: sec.index,
      sectionId: sec.id,
      length: sec.length,
      maxHeight: Math.max(0, ...sec.profile.h),
      ...earth,
      fillLoads: truckLoads(earth.fill, truckLoad),
      cutLoads: truckLoads(earth.cut, truckLoad),
    });
  }
  const fill = jumps.reduce((t, j) => t + j.fill, 0);
  const cut = jumps.reduce((t, j) => t + j.cut, 0);
  return {
    jumps,
    width: doc.trackWidth,
    sideSlope: SIDE_SLOPE,
    truckLoad,
    fill,
    cut,
    fillLoads: truckLoads(fill, truckLoad),
    cutLoads: truckLoads(cut, truckLoad),
  };
}
