import { memo } from "react";
import { Line, Shape } from "react-konva";
import type { AnalysisOverlay, CentreLine } from "~/analysis";
import { binStyle, speedRuns } from "~/lib/editor/speed-scale";
import { worldToScreen, type View } from "~/lib/editor/view";
import { PLAN } from "../colours";

/**
 * The analysis drawn over the track in screen space: the racing line coloured and widened by
 * speed, stretches hidden from the driver stand (dashed) and lanes too close together (dotted);
 * their words are labels of the label layer. Faded while a newer drawing with the same track is
 * being analysed; the editor clears it when the track itself changed.
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
        ctx.setLineDash([8, 5]);
        for (const stretch of overlay.hidden) {
          if (stretch.points.length < 2) continue;
          ctx.beginPath();
          stretch.points.forEach(([x, y], k) => (k ? ctx.lineTo(sx(x), sy(y)) : ctx.moveTo(sx(x), sy(y))));
          ctx.strokeStyle = PLAN.hidden;
          ctx.lineWidth = 4;
          ctx.stroke();
        }
        ctx.setLineDash([2, 4]);
        for (const c of overlay.laneConflicts) {
          ctx.beginPath();
          ctx.moveTo(sx(c.a[0]), sy(c.a[1]));
          ctx.lineTo(sx(c.b[0]), sy(c.b[1]));
          ctx.strokeStyle = PLAN.conflict;
          ctx.lineWidth = 2.5;
          ctx.stroke();
        }
        ctx.setLineDash([]);
      }}
    />
  );
});

/** The centre line "Close the loop" proposes, dashed in the selection colour (screen space). */
export function GhostLine({ line, view }: { line: CentreLine; view: View }) {
  const points: number[] = [];
  for (let i = 0; i < line.count; i++) {
    const p = worldToScreen(view, { x: line.x[i], y: line.y[i] });
    points.push(p.x, p.y);
  }
  return (
    <Line
      name="close-loop-ghost"
      points={points}
      stroke={PLAN.selected}
      strokeWidth={2.5}
      dash={[9, 6]}
      lineCap="round"
      lineJoin="round"
      perfectDrawEnabled={false}
    />
  );
}
