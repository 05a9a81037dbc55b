import { useRef } from "react";
import { Circle, Line, Rect, RegularPolygon } from "react-konva";
import { advancePose, type ResolvedSection, type LayoutDocument } from "~/analysis";
import {
  alongTrack,
  jumpMoveBlocker,
  moveJump,
  sectionHandles,
  straightLengthFromPoint,
  turnAngleFromPoint,
  turnCentre,
  turnRadiusFromPoint,
  type Point,
} from "~/lib/editor/drag-maths";
import { updateSection } from "~/lib/editor/section-ops";
import type { SnapSettings } from "~/lib/editor/snap";
import { screenToWorld, worldToScreen, type View } from "~/lib/editor/view";
import { PLAN } from "../colours";
import { DragPoint } from "./drag-point";

interface Props {
  doc: LayoutDocument;
  resolved: ResolvedSection;
  index: number;
  view: View;
  snap: SnapSettings;
  onChange(doc: LayoutDocument, gesture: string): void;
  onGestureEnd(): void;
}

const DEG = Math.PI / 180;

/** The selected section's handles: a straight's end, a turn's centre and end, a jump's middle. */
export function SectionHandles({ doc, resolved, index, view, snap, onChange, onGestureEnd }: Props) {
  const gesture = useRef("");
  const section = doc.sections[index];
  const handles = sectionHandles(resolved, section, jumpMoveBlocker(doc, index) === null);
  const toScreen = (p: Point) => worldToScreen(view, p);
  const start = () => {
    gesture.current = `handle-${index}-${Date.now()}-${Math.random()}`;
  };
  const common = { draggable: true, onDragStart: start, onDragEnd: onGestureEnd };

  if (section.kind === "straight" && handles.end) {
    return (
      <DragPoint
        name="handle handle-end"
        at={toScreen(handles.end)}
        {...common}
        onDragMove={(s) => {
          const length = straightLengthFromPoint(resolved.start, screenToWorld(view, s), snap);
          if (length !== section.length) onChange(updateSection(doc, index, { length }), gesture.current);
          return toScreen(advancePose(resolved.start, length, 0));
        }}
      >
        <Knob />
      </DragPoint>
    );
  }

  if (section.kind === "turn" && handles.centre && handles.angle) {
    const centre = toScreen(handles.centre);
    const sign = section.direction === "left" ? 1 : -1;
    return (
      <>
        <Line
          points={[
            centre.x,
            centre.y,
            ...xy(toScreen(resolved.start)),
            centre.x,
            centre.y,
            ...xy(toScreen(handles.angle)),
          ]}
          stroke={PLAN.handleStroke}
          strokeWidth={1}
          dash={[4, 4]}
          listening={false}
        />
        <DragPoint
          name="handle handle-radius"
          at={centre}
          {...common}
          onDragMove={(s) => {
            const radius = turnRadiusFromPoint(
              resolved.start,
              section.direction,
              screenToWorld(view, s),
              snap,
            );
            if (radius !== section.radius) onChange(updateSection(doc, index, { radius }), gesture.current);
            return toScreen(turnCentre(resolved.start, radius, section.direction));
          }}
        >
          <Rect
            x={-7}
            y={-7}
            width={14}
            height={14}
            fill={PLAN.handleFill}
            stroke={PLAN.handleStroke}
            strokeWidth={2}
            hitStrokeWidth={14}
          />
        </DragPoint>
        <DragPoint
          name="handle handle-angle"
          at={toScreen(handles.angle)}
          {...common}
          onDragMove={(s) => {
            const angleDeg = turnAngleFromPoint(
              resolved.start,
              section.radius,
              section.direction,
              screenToWorld(view, s),
              section.angleDeg,
              snap,
            );
            if (angleDeg !== section.angleDeg)
              onChange(updateSection(doc, index, { angleDeg }), gesture.current);
            return toScreen(
              advancePose(resolved.start, section.radius * angleDeg * DEG, sign / section.radius),
            );
          }}
        >
          <Knob />
        </DragPoint>
      </>
    );
  }

  if (section.kind === "jump" && handles.move) {
    const mid = handles.move;
    return (
      <DragPoint
        name="handle handle-move"
        at={toScreen(mid)}
        {...common}
        onDragMove={(s) => {
          const delta = alongTrack(resolved, mid, screenToWorld(view, s));
          const next = moveJump(doc, index, delta, snap);
          if (!next || next === doc) return toScreen(mid);
          onChange(next, gesture.current);
          const moved =
            (next.sections[index - 1] as { length: number }).length -
            (doc.sections[index - 1] as { length: number }).length;
          return toScreen({
            x: mid.x + moved * Math.cos(resolved.start.heading),
            y: mid.y + moved * Math.sin(resolved.start.heading),
          });
        }}
      >
        <RegularPolygon
          sides={4}
          radius={10}
          fill={PLAN.handleFill}
          stroke={PLAN.handleStroke}
          strokeWidth={2}
          hitStrokeWidth={14}
        />
      </DragPoint>
    );
  }
  return null;
}

function xy(p: Point): [number, number] {
  return [p.x, p.y];
}

/** A round handle; its readout is a label of the label layer (canvas-labels.ts). */
function Knob() {
  return (
    <Circle
      radius={8}
      fill={PLAN.handleFill}
      stroke={PLAN.handleStroke}
      strokeWidth={2.5}
      hitStrokeWidth={16}
    />
  );
}
