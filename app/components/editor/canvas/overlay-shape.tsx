import { memo } from "react";
import { Shape } from "react-konva";
import type { AnalysisOverlay } from "~/analysis";
import { binStyle, speedRuns } from "~/lib/editor/speed-scale";
import type { View } from "~/lib/editor/view";
import { PLAN } from "../colours";

/**
 * The analysis drawn over the track in screen space: the racing line coloured and widened by
 * speed, stretches hidden from the driver stand (dashed, labelled) and lanes too close together
 * (dotted, with the distance). Faded while a newer drawing is being analysed.
 */
export const OverlayShape = memo(function OverlayShape({
  overlay,
  view,
  stale,
}: {
  overlay: AnalysisOverlay;
  view: View;
  stale: boolean;
}) {
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      opacity={stale ? 0.35 : 1}
      sceneFunc={(context) => {
        const ctx = context._context;
        const sx = (x: number) => view.ox + x * view.scale;
        const sy = (y: number) => view.oy - y * view.scale;
        const { line, speedRange } = overlay;
        ctx.lineCap = "round";
        ctx.lineJoin = "round";
        for (const run of speedRuns(line.speed, speedRange.min, speedRange.max)) {
          const style = binStyle(run.bin);
          ctx.beginPath();
          ctx.moveTo(sx(line.x[run.from]), sy(line.y[run.from]));
          for (let i = run.from + 1; i <= run.to; i++) ctx.lineTo(sx(line.x[i]), sy(line.y[i]));
          ctx.strokeStyle = style.colour;
          ctx.lineWidth = style.width;
          ctx.stroke();
        }
        ctx.font = "600 11px Inter, sans-serif";
        ctx.setLineDash([8, 5]);
        for (const stretch of overlay.hidden) {
          if (stretch.points.length < 2) continue;
          ctx.beginPath();
          stretch.points.forEach(([x, y], k) => (k ? ctx.lineTo(sx(x), sy(y)) : ctx.moveTo(sx(x), sy(y))));
          ctx.strokeStyle = PLAN.hidden;
          ctx.lineWidth = 4;
          ctx.stroke();
          const [mx, my] = stretch.points[Math.floor(stretch.points.length / 2)];
          label(
            ctx,
            `Hidden from the stand (${stretch.length.toFixed(0)} m)`,
            sx(mx),
            sy(my) - 10,
            PLAN.hidden,
          );
        }
        ctx.setLineDash([2, 4]);
        for (const c of overlay.laneConflicts) {
          ctx.beginPath();
          ctx.moveTo(sx(c.a[0]), sy(c.a[1]));
          ctx.lineTo(sx(c.b[0]), sy(c.b[1]));
          ctx.strokeStyle = PLAN.conflict;
          ctx.lineWidth = 2.5;
          ctx.stroke();
          label(
            ctx,
            `Lanes ${c.distance.toFixed(1)} m apart`,
            (sx(c.a[0]) + sx(c.b[0])) / 2,
            (sy(c.a[1]) + sy(c.b[1])) / 2,
            PLAN.conflict,
          );
        }
        ctx.setLineDash([]);
      }}
    />
  );
});

function label(ctx: CanvasRenderingContext2D, text: string, x: number, y: number, colour: string) {
  const w = ctx.measureText(text).width + 8;
  ctx.fillStyle = "rgba(251, 249, 245, 0.9)";
  ctx.fillRect(x - w / 2, y - 9, w, 16);
  ctx.fillStyle = colour;
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  ctx.fillText(text, x, y);
}
