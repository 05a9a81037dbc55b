import type Konva from "konva";
import type { ReactNode } from "react";
import { Group } from "react-konva";
import type { Point } from "~/lib/editor/drag-maths";

export interface DragPointProps {
  name: string;
  /** Screen position, px. */
  at: Point;
  draggable: boolean;
  children: ReactNode;
  onPress?(): void;
  onDragStart?(): void;
  /** Gets the pointer's screen position; returns where the point really goes (snapped, constrained), px. */
  onDragMove?(screen: Point): Point | null;
  onDragEnd?(): void;
}

/**
 * A point in the screen-space layer that can be dragged: after each move the node is put where the
 * editor says it belongs (snapped or constrained), so the handle never drifts from the drawing.
 */
export function DragPoint(p: DragPointProps) {
  const setCursor = (e: Konva.KonvaEventObject<MouseEvent>, cursor: string) => {
    const container = e.target.getStage()?.container();
    if (container) container.style.cursor = cursor;
  };
  return (
    <Group
      name={p.name}
      x={p.at.x}
      y={p.at.y}
      draggable={p.draggable}
      onPointerDown={(e) => {
        e.cancelBubble = true;
        p.onPress?.();
      }}
      onMouseEnter={(e) => p.draggable && setCursor(e, "grab")}
      onMouseLeave={(e) => setCursor(e, "")}
      onDragStart={() => p.onDragStart?.()}
      onDragMove={(e) => {
        const node = e.target;
        const next = p.onDragMove?.({ x: node.x(), y: node.y() });
        if (next) node.position(next);
      }}
      onDragEnd={(e) => {
        // Settle where the drawing says, even if the last move was refused.
        e.target.position(p.at);
        p.onDragEnd?.();
      }}
    >
      {p.children}
    </Group>
  );
}
