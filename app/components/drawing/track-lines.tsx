/**
 * The track drawing's lines, from the back: the site boundary, the track band, stretches hidden
 * from the driver stand, the centre line coloured and widened by speed, and lanes that come too
 * close with their distance.
 */
import type { AnalysisOverlay, LayoutDocument } from "~/analysis";
import { PLAN } from "~/components/editor/colours";
import { binStyle, SPEED_BINS, speedRuns } from "~/lib/editor/speed-scale";
import type { Pen } from "./track-pen";

type Site = Pick<LayoutDocument, "siteBoundary" | "trackWidth">;

export function TrackLines({
  overlay,
  site,
  pts,
  pen,
}: {
  overlay: AnalysisOverlay;
  site: Site;
  /** The centre line's points, plan m. */
  pts: [number, number][];
  pen: Pen;
}) {
  const { P, fs } = pen;
  const poly = (from: number, to: number) =>
    pts
      .slice(from, to + 1)
      .map(([x, y]) => P(x, y))
      .join(" ");
  const runs = speedRuns(overlay.line.speed, overlay.speedRange.min, overlay.speedRange.max, SPEED_BINS);
  return (
    <>
      {site.siteBoundary ? (
        <polygon
          points={site.siteBoundary.map((p) => P(p[0], p[1])).join(" ")}
          fill="none"
          stroke={PLAN.boundary}
          strokeWidth={1}
          strokeDasharray="4 3"
          vectorEffect="non-scaling-stroke"
        />
      ) : null}
      <polyline
        points={poly(0, pts.length - 1)}
        fill="none"
        stroke={PLAN.band}
        strokeWidth={site.trackWidth}
        strokeLinejoin="round"
      />
      {overlay.hidden.map((hs, i) => (
        <polyline
          key={`h${i}`}
          points={hs.points.map(([x, y]) => P(x, y)).join(" ")}
          fill="none"
          stroke={PLAN.hidden}
          strokeOpacity={0.45}
          strokeWidth={site.trackWidth * 0.9}
          strokeDasharray={`${fs * 0.4} ${fs * 0.4}`}
        />
      ))}
      {runs.map((r, i) => {
        const s = binStyle(r.bin, SPEED_BINS);
        return (
          <polyline
            key={i}
            points={poly(r.from, r.to)}
            fill="none"
            stroke={s.colour}
            strokeWidth={s.width}
            strokeLinecap="round"
            strokeLinejoin="round"
            vectorEffect="non-scaling-stroke"
          />
        );
      })}
      <LaneConflicts conflicts={overlay.laneConflicts} pen={pen} />
    </>
  );
}

/** Lanes that come too close: a line between the two points and the distance written on it. */
function LaneConflicts({ conflicts, pen }: { conflicts: AnalysisOverlay["laneConflicts"]; pen: Pen }) {
  return conflicts.map((c, i) => (
    <g key={`c${i}`}>
      <line
        x1={c.a[0]}
        y1={-c.a[1]}
        x2={c.b[0]}
        y2={-c.b[1]}
        stroke={PLAN.conflict}
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <text
        x={(c.a[0] + c.b[0]) / 2}
        y={-(c.a[1] + c.b[1]) / 2}
        fontSize={pen.fs * 0.8}
        fill={PLAN.conflict}
        {...pen.halo}
      >
        {c.distance.toFixed(1)} m apart
      </text>
    </g>
  ));
}
