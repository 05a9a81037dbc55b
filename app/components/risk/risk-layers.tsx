/**
 * The corner-risk sheet's layers over the track drawing (TrackDrawing's `layers`): each zone as a
 * hatched, outlined wedge under the track, and the hotspots as numbered triangles over the track
 * but under the jump and marshal marks (hotspots at one spot share a mark).
 * Hatching and outline carry the meaning on black-and-white paper, not the colour alone.
 */
import type { Hotspot, MarshalZone } from "~/analysis";
import type { DrawingLabel, ExtraLabel } from "~/components/drawing/drawing-labels";
import { LabelText } from "~/components/drawing/track-marks";
import type { Pen } from "~/components/drawing/track-pen";
import { groupHotspots } from "~/lib/risk-sheet-rows";

const ZONE = "#a3261b";
const HOT = "#141b24";

/** The hatch pattern's id (one per page). */
const HATCH_ID = "risk-zone-hatch";

/** Hotspots closer than this many text sizes share one mark. */
const SHARE = 1.2;
/** Half the hotspot triangle's size, as a multiple of the text size. */
const MARK = 0.4;

/** The hotspot numbers, placed with every other label of the drawing by the one label placer. */
export function hotspotLabels(hotspots: readonly Hotspot[]) {
  return (pen: Pen): ExtraLabel[] =>
    groupHotspots(hotspots, pen.fs * SHARE).map((g) => ({
      id: `hotspot-${g.ids[0]}`,
      text: g.ids.join(","),
      x: g.x,
      y: g.y,
      mark: MARK,
      size: 0.6,
      priority: 85,
    }));
}

export function riskLayers(zones: readonly MarshalZone[], hotspots: readonly Hotspot[]) {
  return (pen: Pen, labels: ReadonlyMap<string, DrawingLabel>) => {
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
    const s = pen.fs * MARK;
    const groups = groupHotspots(hotspots, pen.fs * SHARE);
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
    // The numbers go on top, where the one label placer put them.
    const top = (
      <g aria-hidden="true">
        {groups.map((g) => (
          <LabelText key={g.ids[0]} label={labels.get(`hotspot-${g.ids[0]}`)} pen={pen} fill={HOT} />
        ))}
      </g>
    );
    return { under, over, top };
  };
}

/** Every zone corner, so the drawing holds the zones whole. */
export function zoneExtent(zones: readonly MarshalZone[]): [number, number][] {
  return zones.flatMap((z) => z.polygon.map(([x, y]) => [x, y] as [number, number]));
}
