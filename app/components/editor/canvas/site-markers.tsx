import { useRef } from "react";
import { Group, Line, Rect } from "react-konva";
import type { Point } from "~/lib/editor/drag-maths";
import type { Selection } from "~/lib/editor/editor-state";
import { moveBoundaryPoint, moveMarshalPoint, placeDriverStand } from "~/lib/editor/site-ops";
import { snapLength, type SnapSettings } from "~/lib/editor/snap";
import { screenToWorld, worldToScreen, type View } from "~/lib/editor/view";
import type { LayoutDocument } from "~/analysis";
import { PLAN } from "../colours";
import { SYMBOL } from "./canvas-labels";
import { DragPoint } from "./drag-point";

/** A marshal point's diamond, as on the layout page's drawing, px. */
const M = SYMBOL.marshal;
const DIAMOND = [0, -M, M, 0, 0, M, -M, 0];

interface Props {
  doc: LayoutDocument;
  view: View;
  selection: Selection;
  editable: boolean;
  snap: SnapSettings;
  onSelect(selection: Selection): void;
  onChange(doc: LayoutDocument, gesture: string, selection?: Selection): void;
  onGestureEnd(): void;
}

/**
 * The driver stand (a square), the marshal points (diamonds, as on the layout page's drawing) and
 * (while editing) the site boundary's corners, in screen space so their symbols keep their size at
 * any zoom. Their words and M numbers are labels of the label layer.
 */
export function SiteMarkers({
  doc,
  view,
  selection,
  editable,
  snap,
  onSelect,
  onChange,
  onGestureEnd,
}: Props) {
  const gesture = useRef("");
  const begin = (what: string) => () => {
    gesture.current = `${what}-${Date.now()}-${Math.random()}`;
  };
  const toWorld = (s: Point): Point => {
    const w = screenToWorld(view, s);
    return { x: snapLength(w.x, snap), y: snapLength(w.y, snap) };
  };
  const toScreen = (p: Point) => worldToScreen(view, p);
  const isSel = (kind: string, index?: number) =>
    selection?.kind === kind && (index === undefined || ("index" in selection && selection.index === index));
  return (
    <>
      {editable
        ? (doc.siteBoundary ?? []).map(([x, y], i) => (
            <DragPoint
              key={`corner-${i}`}
              name={`corner corner-${i}`}
              at={toScreen({ x, y })}
              draggable
              onPress={() => onSelect({ kind: "boundary", index: i })}
              onDragStart={begin(`corner-${i}`)}
              onDragMove={(s) => {
                const p = toWorld(s);
                onChange(moveBoundaryPoint(doc, i, p), gesture.current, { kind: "boundary", index: i });
                return toScreen(p);
              }}
              onDragEnd={onGestureEnd}
            >
              <Rect
                x={-5}
                y={-5}
                width={10}
                height={10}
                fill={isSel("boundary", i) ? PLAN.selected : PLAN.paper}
                stroke={PLAN.boundary}
                strokeWidth={1.5}
                hitStrokeWidth={12}
              />
            </DragPoint>
          ))
        : null}
      {doc.driverStand ? (
        <DragPoint
          name="stand"
          at={toScreen(doc.driverStand)}
          draggable={editable}
          onPress={() => onSelect({ kind: "stand" })}
          onDragStart={begin("stand")}
          onDragMove={(s) => {
            const p = toWorld(s);
            onChange(placeDriverStand(doc, p), gesture.current, { kind: "stand" });
            return toScreen(p);
          }}
          onDragEnd={onGestureEnd}
        >
          <Rect
            x={-9}
            y={-9}
            width={18}
            height={18}
            cornerRadius={3}
            fill={PLAN.stand}
            stroke={isSel("stand") ? PLAN.selected : PLAN.paper}
            strokeWidth={isSel("stand") ? 3 : 1.5}
          />
          <Line points={[-5, 3, 0, -4, 5, 3]} stroke={PLAN.paper} strokeWidth={2} listening={false} />
        </DragPoint>
      ) : null}
      {doc.marshalPoints.map((m, i) => (
        <DragPoint
          key={`marshal-${i}`}
          name={`marshal marshal-${i}`}
          at={toScreen(m)}
          draggable={editable}
          onPress={() => onSelect({ kind: "marshal", index: i })}
          onDragStart={begin(`marshal-${i}`)}
          onDragMove={(s) => {
            const p = toWorld(s);
            onChange(moveMarshalPoint(doc, i, p), gesture.current, { kind: "marshal", index: i });
            return toScreen(p);
          }}
          onDragEnd={onGestureEnd}
        >
          <Line
            points={DIAMOND}
            closed
            fill={PLAN.marshal}
            stroke={isSel("marshal", i) ? PLAN.text : PLAN.paper}
            strokeWidth={isSel("marshal", i) ? 3 : 1.5}
            hitStrokeWidth={12}
          />
        </DragPoint>
      ))}
    </>
  );
}

/** The start line across the track, with a chequered stripe (its word is a label of the label layer). */
export function StartMarker({ doc, view }: { doc: LayoutDocument; view: View }) {
  const h = (doc.start.headingDeg * Math.PI) / 180;
  const half = (doc.trackWidth / 2) * view.scale;
  const c = worldToScreen(view, doc.start);
  // Across the track on screen: the heading's normal, with screen Y pointing down.
  const nx = -Math.sin(h) * half;
  const ny = -Math.cos(h) * half;
  const pts = [c.x - nx, c.y - ny, c.x + nx, c.y + ny];
  return (
    <Group listening={false}>
      <Line points={pts} stroke={PLAN.text} strokeWidth={5} />
      <Line points={pts} stroke="#ffffff" strokeWidth={5} dash={[4, 4]} />
    </Group>
  );
}
