import { memo, useMemo } from "react";
import { Group, Label, Line, Tag, Text } from "react-konva";
import type { LayoutSection } from "~/lib/layout-document";
import { PLAN } from "../colours";
import { localDrawing } from "./section-geometry";

export interface SectionShapeProps {
  section: LayoutSection;
  index: number;
  trackWidth: number;
  /** Start pose: plan m and heading deg. */
  x: number;
  y: number;
  headingDeg: number;
  selected: boolean;
  /** Zoom, px per m (labels keep their size on screen). */
  scale: number;
  showLabel: boolean;
}

/**
 * One section of the track in plan, drawn in its own frame and placed at its start pose. Memoised:
 * a change to another section only moves this group (new x, y, rotation), it is not rebuilt.
 */
export const SectionShape = memo(function SectionShape(p: SectionShapeProps) {
  const drawing = useMemo(() => localDrawing(p.section, p.trackWidth), [p.section, p.trackWidth]);
  const name = `section-${p.index}`;
  const chevron = Math.min(1.2, p.trackWidth / 3);
  return (
    <Group x={p.x} y={p.y} rotation={p.headingDeg}>
      <Line
        name={name}
        points={drawing.band}
        closed
        fill={PLAN.band}
        stroke={p.selected ? PLAN.selected : PLAN.bandEdge}
        strokeWidth={p.selected ? 3 : 1}
        strokeScaleEnabled={false}
        perfectDrawEnabled={false}
      />
      {drawing.jump ? (
        <Group listening={false}>
          <Line points={drawing.jump.mound} closed fill={PLAN.face} opacity={0.35} perfectDrawEnabled={false} />
          <Line points={drawing.jump.face} closed fill={PLAN.face} opacity={0.9} perfectDrawEnabled={false} />
          <Line points={drawing.jump.landing} closed fill={PLAN.landing} stroke={PLAN.lip} strokeWidth={1} dash={[4, 3]} strokeScaleEnabled={false} perfectDrawEnabled={false} />
          <Line points={drawing.jump.lip} stroke={PLAN.lip} strokeWidth={3} strokeScaleEnabled={false} />
        </Group>
      ) : null}
      <Line points={drawing.centre} stroke={PLAN.centre} strokeWidth={1} dash={[6, 5]} strokeScaleEnabled={false} listening={false} perfectDrawEnabled={false} />
      <Line points={drawing.endTick} stroke={PLAN.bandEdge} strokeWidth={1} strokeScaleEnabled={false} listening={false} />
      <Group x={drawing.mid.x} y={drawing.mid.y} rotation={drawing.mid.headingDeg} listening={false}>
        <Line points={[-chevron * 0.5, -chevron * 0.45, 0, 0, -chevron * 0.5, chevron * 0.45]} stroke={PLAN.centre} strokeWidth={1.5} strokeScaleEnabled={false} />
      </Group>
      {p.showLabel || p.selected ? (
        <Group x={drawing.mid.x} y={drawing.mid.y} rotation={-p.headingDeg} scaleX={1 / p.scale} scaleY={-1 / p.scale} listening={false}>
          <Label x={6} y={-22}>
            <Tag fill={p.selected ? PLAN.selected : PLAN.paper} stroke={PLAN.bandEdge} strokeWidth={0.5} cornerRadius={3} />
            <Text text={String(p.index + 1)} fontSize={11} fontFamily="Inter, sans-serif" padding={3} fill={p.selected ? "#ffffff" : PLAN.text} />
          </Label>
        </Group>
      ) : null}
    </Group>
  );
});
