import type Konva from "konva";
import { memo, useCallback, useMemo } from "react";
import { Shape } from "react-konva";
import type { LayoutSection } from "~/analysis";
import { PLAN } from "../colours";
import { localDrawing, type LocalSectionDrawing } from "./section-geometry";

export interface SectionShapeProps {
  section: LayoutSection;
  index: number;
  trackWidth: number;
  /** Start pose: plan m and heading deg. */
  x: number;
  y: number;
  headingDeg: number;
  selected: boolean;
  /** Zoom, px per m (line widths keep their size on screen). */
  scale: number;
}

/**
 * One section of the track in plan (its number is a label of the label layer), drawn by one konva shape in the section's own frame and placed
 * at its start pose. Memoised: when an earlier section changes, this shape only gets a new x, y
 * and rotation; its drawing is not rebuilt. One shape per section (rather than one per stripe)
 * keeps a redraw of a 60-section layout to 60 draw calls.
 */
export const SectionShape = memo(function SectionShape(p: SectionShapeProps) {
  const drawing = useMemo(() => localDrawing(p.section, p.trackWidth), [p.section, p.trackWidth]);
  const { selected, scale, index } = p;
  const sceneFunc = useCallback(
    (context: Konva.Context) => drawSection(context._context, drawing, { selected, scale }),
    [drawing, selected, scale],
  );
  const hitFunc = useCallback(
    (context: Konva.Context, shape: Konva.Shape) => {
      path(context._context, drawing.band, true);
      context.fillStrokeShape(shape);
    },
    [drawing],
  );
  // The fill only tells konva the hit area is filled; the scene is painted by drawSection.
  return (
    <Shape
      name={`section-${index}`}
      x={p.x}
      y={p.y}
      rotation={p.headingDeg}
      sceneFunc={sceneFunc}
      hitFunc={hitFunc}
      fill="#000"
      perfectDrawEnabled={false}
    />
  );
});

function path(ctx: CanvasRenderingContext2D, pts: number[], closed: boolean) {
  ctx.beginPath();
  ctx.moveTo(pts[0], pts[1]);
  for (let k = 2; k < pts.length; k += 2) ctx.lineTo(pts[k], pts[k + 1]);
  if (closed) ctx.closePath();
}

function drawSection(
  ctx: CanvasRenderingContext2D,
  d: LocalSectionDrawing,
  o: { selected: boolean; scale: number },
) {
  const px = 1 / o.scale; // one screen pixel in section units (m)
  path(ctx, d.band, true);
  ctx.fillStyle = PLAN.band;
  ctx.fill();
  if (d.jump) {
    ctx.globalAlpha = 0.35;
    path(ctx, d.jump.mound, true);
    ctx.fillStyle = PLAN.face;
    ctx.fill();
    ctx.globalAlpha = 0.9;
    path(ctx, d.jump.face, true);
    ctx.fill();
    ctx.globalAlpha = 1;
    path(ctx, d.jump.landing, true);
    ctx.fillStyle = PLAN.landing;
    ctx.fill();
    ctx.setLineDash([4 * px, 3 * px]);
    ctx.strokeStyle = PLAN.lip;
    ctx.lineWidth = px;
    ctx.stroke();
    ctx.setLineDash([]);
    path(ctx, d.jump.lip, false);
    ctx.lineWidth = 3 * px;
    ctx.stroke();
  }
  path(ctx, d.centre, false);
  ctx.setLineDash([6 * px, 5 * px]);
  ctx.strokeStyle = PLAN.centre;
  ctx.lineWidth = px;
  ctx.stroke();
  ctx.setLineDash([]);
  path(ctx, d.endTick, false);
  ctx.strokeStyle = PLAN.bandEdge;
  ctx.stroke();
  // direction of travel: a chevron at the middle
  const c = d.chevron;
  ctx.beginPath();
  ctx.moveTo(c[0], c[1]);
  ctx.lineTo(c[2], c[3]);
  ctx.lineTo(c[4], c[5]);
  ctx.strokeStyle = PLAN.centre;
  ctx.lineWidth = 1.5 * px;
  ctx.stroke();
  path(ctx, d.band, true);
  ctx.strokeStyle = o.selected ? PLAN.selected : PLAN.bandEdge;
  ctx.lineWidth = (o.selected ? 3 : 1) * px;
  ctx.stroke();
}
