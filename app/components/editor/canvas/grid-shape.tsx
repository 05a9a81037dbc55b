import { memo } from "react";
import { Shape } from "react-konva";
import { niceStep, type LengthUnit } from "~/lib/editor/units";
import type { View } from "~/lib/editor/view";
import { PLAN } from "../colours";

/**
 * The plan grid in screen space: lines at a round step of the display unit at least 24 px apart,
 * every fifth line darker. One shape draws every line, so the grid costs one draw call.
 */
export const GridShape = memo(function GridShape({
  view,
  width,
  height,
  units,
}: {
  view: View;
  width: number;
  height: number;
  units: LengthUnit;
}) {
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(context) => {
        const ctx = context._context;
        const { metres } = niceStep(view.scale, units, 24);
        const px = metres * view.scale;
        const firstX = Math.ceil(-view.ox / px);
        const lastX = Math.floor((width - view.ox) / px);
        const firstY = Math.ceil((view.oy - height) / px);
        const lastY = Math.floor(view.oy / px);
        for (const major of [false, true]) {
          ctx.beginPath();
          for (let k = firstX; k <= lastX; k++) {
            if ((k % 5 === 0) !== major) continue;
            const x = Math.round(view.ox + k * px) + 0.5;
            ctx.moveTo(x, 0);
            ctx.lineTo(x, height);
          }
          for (let k = firstY; k <= lastY; k++) {
            if ((k % 5 === 0) !== major) continue;
            const y = Math.round(view.oy - k * px) + 0.5;
            ctx.moveTo(0, y);
            ctx.lineTo(width, y);
          }
          ctx.strokeStyle = major ? PLAN.gridMajor : PLAN.gridMinor;
          ctx.lineWidth = 1;
          ctx.stroke();
        }
      }}
    />
  );
});
