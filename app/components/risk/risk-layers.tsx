/**
 * The corner-risk sheet's layers over the track drawing (TrackDrawing's `layers`): each zone as a
 * hatched, outlined wedge under the track, and the hotspots as numbered triangles over the track
 * but under the jump and marshal marks (hotspots at one spot share a mark).
 * Hatching and outline carry the meaning on black-and-white paper, not the colour alone.
 */
import type { Hotspot, MarshalZone } from "~/analysis";
import type { Pen } from "~/components/drawing/track-pen";
import { groupHotspots } from "~/lib/risk-sheet-rows";

const ZONE = "#a3261b";
const HOT = "#141b24";

/** The hatch pattern's id (one per page). */
const HATCH_ID = "risk-zone-hatch";

export function riskLayers(zones: readonly MarshalZone[], hotspots: readonly Hotspot[]) {
  return (pen: Pen) => {
    const gap = pen.fs * 0.5;
    const under = (
      <g aria-label={`${zones.length} overshoot and run-off zones, hatched`}>
        <defs>
          <pattern
            id={HATCH_ID}
            patternUnits="userSpaceOnUse"
            width={gap}
            height={gap}
            patternTransform="rotate(45)"
          >
            <line x1={0} y1={0} x2={0} y2={gap} stroke={ZONE} strokeWidth={gap * 0.22} />
          </pattern>
        </defs>
        {zones.map((z) => (
          <polygon
            key={z.id}
            points={z.polygon.map(([x, y]) => pen.P(x, y)).join(" ")}
            fill={`url(#${HATCH_ID})`}
            fillOpacity={0.55}
            stroke={ZONE}
            strokeWidth={1.2}
            strokeDasharray="5 3"
            vectorEffect="non-scaling-stroke"
          >
            <title>{`${z.title}: ${z.kind} zone`}</title>
          </polygon>
        ))}
      </g>
    );
    const s = pen.fs * 0.4;
    const groups = groupHotspots(hotspots, pen.fs * 1.2);
    const at = (g: { x: number; y: number }) => pen.P(g.x, g.y).split(",").map(Number);
    const over = (
      <g aria-label={`${hotspots.length} hotspots, numbered`}>
        {groups.map((g) => {
          const [cx, cy] = at(g);
          return (
            <path
              key={g.ids[0]}
              d={`M${cx} ${cy - s} L${cx + s} ${cy + s * 0.75} L${cx - s} ${cy + s * 0.75} Z`}
              fill="#ffffff"
              stroke={HOT}
              strokeWidth={1.2}
              vectorEffect="non-scaling-stroke"
            />
          );
        })}
      </g>
    );
    // The numbers go on top, below and left of the mark (jump labels sit to the right).
    const top = (
      <g aria-hidden="true">
        {groups.map((g) => {
          const [cx, cy] = at(g);
          return (
            <text
              key={g.ids[0]}
              x={cx - pen.fs * 0.5}
              y={cy + pen.fs * 1.3}
              textAnchor="end"
              fontSize={pen.fs * 0.6}
              fontWeight={600}
              fill={HOT}
              {...pen.halo}
            >
              {g.ids.join(",")}
            </text>
          );
        })}
      </g>
    );
    return { under, over, top };
  };
}

/** Every zone corner, so the drawing holds the zones whole. */
export function zoneExtent(zones: readonly MarshalZone[]): [number, number][] {
  return zones.flatMap((z) => z.polygon.map(([x, y]) => [x, y] as [number, number]));
}
