import { PLAN } from "~/components/editor/colours";

/**
 * What every part of the track drawing draws with: the text size, a plan point written as SVG
 * coordinates (plan y points up, SVG y down) and the paper-coloured halo that keeps text readable
 * over the track.
 */
export interface Pen {
  /** Text size, m (the drawing's larger side over 55). */
  fs: number;
  /** A plan point (m) as "x,y" in SVG coordinates. */
  P(x: number, y: number): string;
  halo: {
    paintOrder: "stroke";
    stroke: string;
    strokeWidth: number;
    strokeLinejoin: "round";
  };
}

/**
 * A pen for a drawing whose larger side is `span` m: text 1/55 of it (a wide screen, paper). A
 * phone passes its width over 26, so text stays about 11 px or more on a 360 px wide drawing.
 */
export function makePen(span: number, divisor = 55): Pen {
  const fs = span / divisor;
  return {
    fs,
    P: (x, y) => `${x.toFixed(2)},${(-y).toFixed(2)}`,
    halo: { paintOrder: "stroke", stroke: PLAN.paper, strokeWidth: fs * 0.25, strokeLinejoin: "round" },
  };
}
