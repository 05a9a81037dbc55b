/**
 * The plan's racing line as one text for the reader pages' data: "x,y,speed,section" per point,
 * points separated by spaces, coordinates and speeds to the centimetre. Some five hundred points
 * as four arrays cost React Router's encoder a value each on every request; one text costs it
 * one (docs/decisions/0459-reader-page-speed.md). The page unpacks it once, so the components
 * get the overlay as the engine made it. Pure; both sides use it.
 */
import type { AnalysisOverlay } from "~/analysis";

type Line = AnalysisOverlay["line"];

/** An overlay whose line travels as text. */
export type PackedOverlay = Omit<AnalysisOverlay, "line"> & { line: string };

const cm = (v: number) => String(Math.round(v * 100) / 100);

/** The line as text, to the centimetre (m, m/s). */
export function packLine(line: Line): string {
  const out: string[] = [];
  for (let i = 0; i < line.x.length; i++)
    out.push(`${cm(line.x[i])},${cm(line.y[i])},${cm(line.speed[i])},${line.sectionIndex[i]}`);
  return out.join(" ");
}

/** The line back as arrays. */
export function unpackLine(text: string): Line {
  const line: Line = { x: [], y: [], speed: [], sectionIndex: [] };
  if (!text) return line;
  for (const point of text.split(" ")) {
    const [x, y, speed, section] = point.split(",");
    line.x.push(Number(x));
    line.y.push(Number(y));
    line.speed.push(Number(speed));
    line.sectionIndex.push(Number(section));
  }
  return line;
}

export const packOverlay = (o: AnalysisOverlay): PackedOverlay => ({ ...o, line: packLine(o.line) });
export const unpackOverlay = (o: PackedOverlay): AnalysisOverlay => ({ ...o, line: unpackLine(o.line) });

/** A page's analysis data with its overlay unpacked (what the page's components take). */
export function withUnpackedOverlay<
  D extends { result: { ok: true; overlay: PackedOverlay } | { ok: false } },
>(d: D) {
  type Unpacked = Omit<D, "result"> & {
    result: D["result"] extends infer R
      ? R extends { ok: true; overlay: PackedOverlay }
        ? Omit<R, "overlay"> & { overlay: AnalysisOverlay }
        : R
      : never;
  };
  if (!d.result.ok) return d as unknown as Unpacked;
  return { ...d, result: { ...d.result, overlay: unpackOverlay(d.result.overlay) } } as unknown as Unpacked;
}
