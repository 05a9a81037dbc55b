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
  /** Zoom, px per m (line widths and the label keep their size on screen). */
  scale: number;
  showLabel: boolean;
}

/**
 * One section of the track in plan, drawn by one konva shape in the section's own frame and placed
 * at its start pose. Memoised: when an earlier section changes, this shape only gets a new x, y
 * and rotation; its drawing is not rebuilt. One shape per section (rather than one per stripe)
 * keeps a redraw of a 60-section layout to 60 draw calls.
 */
export const SectionShape = memo(function SectionShape(p: SectionShapeProps) {
  const drawing = useMemo(() => localDrawing(p.section, p.trackWidth), [p.section, p.trackWidth]);
  const { selected, scale, showLabel, index } = p;
  const sceneFunc = useCallback(
    (context: Konva.Context, shape: Konva.Shape) =>
      drawSection(context._context, shape, drawing, {
        selected,
        scale,
        label: showLabel || selected ? String(index + 1) : null,
      }),
    [drawing, selected, scale, showLabel, index],
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
  shape: Konva.Shape,
  d: LocalSectionDrawing,
  o: { selected: boolean; scale: number; label: string | null },
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
  if (o.label) drawLabel(ctx, shape, d, o.label, o.selected);
}

/** The section number beside its middle, upright and at a fixed size on screen. */
function drawLabel(
  ctx: CanvasRenderingContext2D,
  shape: Konva.Shape,
  d: LocalSectionDrawing,
  text: string,
  selected: boolean,
) {
  const at = ctx.getTransform().transformPoint(new DOMPoint(d.mid.x, d.mid.y));
  const ratio = shape.getLayer()?.getCanvas().getPixelRatio() ?? 1;
  ctx.save();
  ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
  const x = at.x / ratio + 6;
  const y = at.y / ratio - 20;
  ctx.font = "11px Inter, sans-serif";
  const w = 7 * text.length + 6;
  ctx.fillStyle = selected ? PLAN.selected : PLAN.paper;
  ctx.strokeStyle = PLAN.bandEdge;
  ctx.lineWidth = 0.5;
  ctx.fillRect(x, y, w, 16);
  ctx.strokeRect(x, y, w, 16);
  ctx.fillStyle = selected ? "#ffffff" : PLAN.text;
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  ctx.fillText(text, x + w / 2, y + 8.5);
  ctx.restore();
}
