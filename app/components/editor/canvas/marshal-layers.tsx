/**
 * The marshal plan on the plan canvas: the overshoot and run-off zones in their own layer under
 * the track (never listening; redrawn only when the zones, their fading or the view change, never
 * while an unrelated layer is dragged), each a konva shape named "marshal-zone": a pale fill, 45°
 * hatching and a dashed outline, so it reads in black and white as on the corner-risk sheet; and
 * the hotspots as triangles over the track (shapes named "marshal-hotspot"; their numbers are
 * labels of the label layer).
 */
import { memo, useMemo } from "react";
import { Layer, Shape } from "react-konva";
import { HOTSPOT_MARK_PX as MARK, hotspotMarks, zoneOnScreen } from "~/lib/editor/marshal-drawing";
import type { View } from "~/lib/editor/view";
import type { CanvasMarshal } from "../canvas-types";
import { PLAN } from "../colours";

/** Opacity of zones and hotspots while a newer drawing is being checked. */
const FADED = 0.35;

export const MarshalZonesLayer = memo(function MarshalZonesLayer({
  marshal,
  view,
}: {
  marshal: CanvasMarshal | null;
  view: View;
}) {
  const zones = marshal?.zones;
  const drawn = useMemo(
    () => (zones ?? []).map((z) => ({ id: z.id, ...zoneOnScreen(z.polygon, view) })),
    [zones, view],
  );
  return (
    <Layer listening={false} name="marshal-zones-layer">
      {drawn.map((z) => (
        <Shape
          key={z.id}
          name="marshal-zone"
          listening={false}
          perfectDrawEnabled={false}
          opacity={marshal?.stale ? FADED : 1}
          sceneFunc={(context) => {
            const ctx = context._context;
            const path = () => {
              ctx.beginPath();
              for (let i = 0; i < z.outline.length; i += 2)
                (i ? ctx.lineTo : ctx.moveTo).call(ctx, z.outline[i], z.outline[i + 1]);
              ctx.closePath();
            };
            path();
            ctx.fillStyle = PLAN.zoneFill;
            ctx.fill();
            ctx.beginPath();
            for (const [x1, y1, x2, y2] of z.hatch) {
              ctx.moveTo(x1, y1);
              ctx.lineTo(x2, y2);
            }
            ctx.strokeStyle = PLAN.zone;
            ctx.lineWidth = 1.2;
            ctx.setLineDash([]);
            ctx.stroke();
            path();
            ctx.lineWidth = 1.5;
            ctx.setLineDash([6, 4]);
            ctx.stroke();
            ctx.setLineDash([]);
          }}
        />
      ))}
    </Layer>
  );
});

/** The hotspots as white triangles outlined in ink (one mark for close ones). */
export const HotspotMarks = memo(function HotspotMarks({
  marshal,
  view,
}: {
  marshal: CanvasMarshal | null;
  view: View;
}) {
  const hotspots = marshal?.hotspots;
  const groups = useMemo(() => hotspotMarks(hotspots ?? [], view), [hotspots, view]);
  return (
    <>
      {groups.map((g) => (
        <Shape
          key={g.ids[0]}
          name="marshal-hotspot"
          listening={false}
          perfectDrawEnabled={false}
          opacity={marshal?.stale ? FADED : 1}
          sceneFunc={(context) => {
            const ctx = context._context;
            const { x, y } = g;
            ctx.beginPath();
            ctx.moveTo(x, y - MARK);
            ctx.lineTo(x + MARK, y + MARK * 0.75);
            ctx.lineTo(x - MARK, y + MARK * 0.75);
            ctx.closePath();
            ctx.fillStyle = PLAN.handleFill;
            ctx.fill();
            ctx.strokeStyle = PLAN.text;
            ctx.lineWidth = 1.5;
            ctx.stroke();
          }}
        />
      ))}
    </>
  );
});
