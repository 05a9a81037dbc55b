/**
 * Geometry of the jump's side view (pure): the profile, the flight at the planned takeoff speed,
 * the scales (heights stretched so a low lip stays visible) and the ground and landing paths in
 * the picture's pixels.
 */
import { flyJump, jumpProfile, type JumpSection } from "~/analysis";

/** The picture's size and margin, px. */
export const W = 320;
export const H = 130;
export const PAD = 14;

export function sideViewGeometry(section: JumpSection, takeoffSpeed: number | undefined) {
  const p = jumpProfile(section);
  const flight = takeoffSpeed ? flightPath(p, takeoffSpeed) : null;
  const maxH = Math.max(0.3, ...p.h, ...(flight ?? []).map(([, h]) => h));
  const length = Math.max(p.length * 1.15 + 0.5, ...(flight ?? []).map(([d]) => d + 0.3));
  /** Pixels per metre along and up. */
  const sx = (W - 2 * PAD) / length;
  const sy = Math.min(sx * 4, (H - 2 * PAD - 10) / maxH);
  const X = (d: number) => PAD + d * sx;
  const Y = (h: number) => H - PAD - h * sy;
  const ground =
    `M ${X(-0.2)} ${Y(0)} ` +
    p.d.map((d, k) => `L ${X(d)} ${Y(p.h[k])}`).join(" ") +
    ` L ${X(length)} ${Y(0)} L ${X(length)} ${H} L ${X(-0.2)} ${H} Z`;
  const ramp = p.d
    .slice(p.landingStartIndex, p.landingEndIndex + 1)
    .map((d, k) => `${k ? "L" : "M"} ${X(d)} ${Y(p.h[p.landingStartIndex + k])}`)
    .join(" ");
  return { p, flight, sx, sy, X, Y, ground, ramp };
}

/** The flight from the lip at the planned speed along the face (no drag), as [d, h] points. */
function flightPath(p: ReturnType<typeof jumpProfile>, speed: number): [number, number][] | null {
  const surface = p.d.slice(p.lipIndex).map((d, k) => ({ x: d, z: p.h[p.lipIndex + k] }));
  const lip = { x: p.d[p.lipIndex], z: p.h[p.lipIndex] };
  try {
    const f = flyJump({ speed, faceAngleRad: p.faceAngle, lip, surface });
    const pts: [number, number][] = [];
    for (let k = 0; k <= 24; k++) {
      const t = (f.airtime * k) / 24;
      pts.push([
        lip.x + speed * Math.cos(p.faceAngle) * t,
        lip.z + speed * Math.sin(p.faceAngle) * t - (9.81 * t * t) / 2,
      ]);
    }
    return pts;
  } catch {
    return null;
  }
}
