/**
 * Hatching a polygon with parallel lines (the corner-risk PDF draws its zones so, since pdf-lib
 * has no pattern fill): the pieces of lines `spacing` apart at `angleDeg` that lie inside the
 * polygon, by even-odd crossing. Units are the caller's (the PDF passes points).
 */
export type XY = readonly [number, number];

/** Segments [[x1, y1], [x2, y2]] inside `polygon`, lines `spacing` apart at `angleDeg` from +x. */
export function hatchSegments(polygon: readonly XY[], spacing: number, angleDeg = 45): [XY, XY][] {
  if (polygon.length < 3 || !(spacing > 0)) return [];
  const a = (angleDeg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  // Rotate so the hatch lines are horizontal: v is the coordinate across them.
  const rot = polygon.map(([x, y]) => [x * c + y * s, -x * s + y * c] as const);
  const back = (u: number, v: number): XY => [u * c - v * s, u * s + v * c];
  const vs = rot.map((p) => p[1]);
  const lo = Math.min(...vs);
  const hi = Math.max(...vs);
  const out: [XY, XY][] = [];
  for (let v = Math.ceil(lo / spacing) * spacing; v <= hi; v += spacing) {
    const us: number[] = [];
    for (let i = 0; i < rot.length; i++) {
      const [u1, v1] = rot[i];
      const [u2, v2] = rot[(i + 1) % rot.length];
      if (v1 <= v !== v2 <= v) us.push(u1 + ((v - v1) / (v2 - v1)) * (u2 - u1));
    }
    us.sort((p, q) => p - q);
    for (let k = 0; k + 1 < us.length; k += 2) out.push([back(us[k], v), back(us[k + 1], v)]);
  }
  return out;
}
