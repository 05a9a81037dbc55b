import type { ReactNode } from "react";
import type { AnalysisOverlay, LayoutDocument } from "~/analysis";
import { PLAN } from "~/components/editor/colours";
import { SPEED_BINS } from "~/lib/editor/speed-scale";
import { extent, type Extent } from "./drawing-geometry";
import { drawingLabels, type DrawingLabel, type ExtraLabel } from "./drawing-labels";
import { DrawingLegend } from "./drawing-legend";
import { TrackLines } from "./track-lines";
import { JumpMarks, SiteMarks, StartAndSpeeds } from "./track-marks";
import { makePen, type Pen } from "./track-pen";

type Site = Pick<LayoutDocument, "driverStand" | "marshalPoints" | "siteBoundary" | "trackWidth">;

type Props = {
  overlay: AnalysisOverlay;
  site: Site;
  /** Jump numbers in track order (J1, ...) and names, by section id. */
  numbers: Record<string, number>;
  names: Record<string, string>;
  jumpHref: (sectionId: string) => string;
  title: string;
  classLabel: string;
  /** More plan points the drawing must hold (a zone's far end), m. */
  extraPoints?: readonly [number, number][];
  /** Layers of another page (the corner-risk sheet's zones and hotspots), drawn with the same pen: `under` below the track, `over` above it and below the marks, `top` last. */
  layers?: (
    pen: Pen,
    labels: ReadonlyMap<string, DrawingLabel>,
  ) => { under?: ReactNode; over?: ReactNode; top?: ReactNode };
  /** Labels the layers add, placed with every other label by the one label placer. */
  extraLabels?: (pen: Pen) => readonly ExtraLabel[];
};

/**
 * The layout drawn to scale from above: the track band, the centre line coloured and widened by
 * the speed of the chosen class, speeds printed at each corner and straight, jump marks whose shape
 * gives the verdict (each a link to the jump's page), the driver stand, marshal points, the site
 * boundary, stretches hidden from the stand and lanes that come too close. The parts are drawn by
 * track-lines.tsx and track-marks.tsx with one pen (track-pen.ts); every label is placed by the
 * label placer the editor's canvas uses too (drawing-labels.ts), so none overlaps another or is cut
 * off at the edge.
 */
export function TrackDrawing({
  overlay,
  site,
  numbers,
  names,
  jumpHref,
  title,
  classLabel,
  extraPoints = [],
  layers,
  extraLabels,
}: Props) {
  const { line, speedRange } = overlay;
  const pts: [number, number][] = line.x.map((x, i) => [x, line.y[i]]);
  const others: [number, number][] = [
    ...(site.siteBoundary ?? []).map((p) => [p[0], p[1]] as [number, number]),
    ...site.marshalPoints.map((m) => [m.x, m.y] as [number, number]),
    ...(site.driverStand ? [[site.driverStand.x, site.driverStand.y] as [number, number]] : []),
  ];
  const box = extent([...pts, ...others, ...extraPoints], site.trackWidth + 2);
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const viewBox = `${box.minX.toFixed(2)} ${(-box.maxY).toFixed(2)} ${w.toFixed(2)} ${h.toFixed(2)}`;
  // Two drawings of the same plan: wide screens and paper, and a phone's with larger text (its
  // width governs, so the labels stay readable); CSS shows one.
  const drawings = [
    { pen: makePen(Math.max(w, h)), className: "hidden sm:block print:block", maxHeight: "70vh" },
    { pen: makePen(w, 26), className: "sm:hidden print:hidden", maxHeight: undefined },
  ];
  return (
    <figure className="space-y-3">
      {drawings.map(({ pen, className, maxHeight }) => (
        <svg
          key={className}
          viewBox={viewBox}
          className={`h-auto w-full rounded-lg border border-sand-200 ${className}`}
          style={{ background: PLAN.paper, maxHeight }}
          role="group"
          aria-label={`${title}: plan drawn to scale, ${overlay.jumps.length} jumps marked`}
          fontFamily="Inter, sans-serif"
        >
          <PlanParts
            overlay={overlay}
            site={site}
            pts={pts}
            numbers={numbers}
            names={names}
            jumpHref={jumpHref}
            pen={pen}
            box={box}
            layers={layers}
            extraLabels={extraLabels}
          />
        </svg>
      ))}
      <figcaption className="space-y-3">
        <p className="text-sm text-ink-700">
          Drawn to scale from above for the {classLabel}: lap {overlay.lapLength.toFixed(0)} m, speeds from{" "}
          {speedRange.min.toFixed(1)} to {speedRange.max.toFixed(1)} m/s (model estimate).
        </p>
        <DrawingLegend
          min={speedRange.min}
          max={speedRange.max}
          bins={SPEED_BINS}
          hidden={overlay.hidden.length > 0}
          conflicts={overlay.laneConflicts.length > 0}
        />
      </figcaption>
    </figure>
  );
}

function PlanParts({
  overlay,
  site,
  pts,
  numbers,
  names,
  jumpHref,
  pen,
  box,
  layers,
  extraLabels,
}: Pick<Props, "overlay" | "site" | "numbers" | "names" | "jumpHref" | "layers" | "extraLabels"> & {
  pts: [number, number][];
  pen: Pen;
  box: Extent;
}) {
  const labels = drawingLabels({ overlay, site, pts, numbers, pen, box, extra: extraLabels?.(pen) });
  const extra = layers?.(pen, labels);
  return (
    <>
      {extra?.under}
      <TrackLines overlay={overlay} site={site} pts={pts} labels={labels} pen={pen} />
      <StartAndSpeeds pts={pts} trackWidth={site.trackWidth} labels={labels} pen={pen} />
      {extra?.over}
      <SiteMarks site={site} labels={labels} pen={pen} />
      <JumpMarks
        jumps={overlay.jumps}
        numbers={numbers}
        names={names}
        jumpHref={jumpHref}
        labels={labels}
        pen={pen}
      />
      {extra?.top}
    </>
  );
}
