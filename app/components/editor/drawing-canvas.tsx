/**
 * The plan canvas (konva). Loaded lazily and only in the browser, by the editor and the plan view:
 * konva lives in this chunk alone. Layers, from the back: grid, photo and site boundary (never
 * listening); the track (one memoised group per section); the analysis overlay; markers and
 * handles in screen space. A drag redraws the track and handle layers only.
 */
import type Konva from "konva";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { Group, Layer, Line, Stage } from "react-konva";
import { sampleCentreLine } from "~/analysis";
import { fitView, layoutBounds, panBy, screenToWorld, zoomAt, type View } from "~/lib/editor/view";
import { moveBackground } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import type { Selection } from "~/lib/editor/editor-state";
import { PLAN } from "./colours";
import type { DrawingCanvasProps } from "./canvas-types";
import { ScaleBar, SpeedLegend, ZoomControls } from "./canvas-overlays";
import { GridShape } from "~/components/editor/canvas/grid-shape";
import { OverlayShape } from "~/components/editor/canvas/overlay-shape";
import { PhotoImage } from "~/components/editor/canvas/photo-image";
import { SectionHandles } from "~/components/editor/canvas/section-handles";
import { SectionShape } from "~/components/editor/canvas/section-shape";
import { SiteMarkers, StartMarker } from "~/components/editor/canvas/site-markers";
import { CalibrationMarks, VerdictMarkers } from "~/components/editor/canvas/verdict-markers";

const RAD = 180 / Math.PI;

type Press = {
  x: number;
  y: number;
  lastX: number;
  lastY: number;
  moved: boolean;
  target: Selection | "empty";
  photo: boolean;
};

export default function DrawingCanvas(props: DrawingCanvasProps) {
  const { doc, sections, selection, editable, mode, overlay } = props;
  const wrapper = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<View | null>(null);
  const press = useRef<Press | null>(null);
  const space = useRef(false);
  const photoGesture = useRef("");
  /** While a handle is dragged the track layer skips its hit canvas (nothing can be clicked then). */
  const [dragging, setDragging] = useState(false);

  const fit = useCallback(() => {
    if (!size.width) return;
    const line = sections.length ? sampleCentreLine(sections, 1) : null;
    setView(fitView(layoutBounds(doc, line), size.width, size.height));
    // Fitting reads the drawing only when asked, not on every change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [size.width, size.height]);

  useEffect(() => {
    const el = wrapper.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) =>
      setSize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) }),
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const fitted = useRef(-1);
  useEffect(() => {
    if (size.width && fitted.current !== props.fitRequest) {
      fitted.current = props.fitRequest;
      fit();
    }
  }, [size.width, props.fitRequest, fit]);

  // Wheel zoom about the cursor; a native listener, since React's wheel listener is passive.
  useEffect(() => {
    const el = wrapper.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const rect = el.getBoundingClientRect();
      const at = { x: e.clientX - rect.left, y: e.clientY - rect.top };
      setView((v) => (v ? zoomAt(v, at, Math.exp(-e.deltaY * 0.0015)) : v));
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, []);

  useEffect(() => {
    const typing = (t: EventTarget | null) =>
      t instanceof HTMLElement &&
      (t.isContentEditable || ["INPUT", "TEXTAREA", "SELECT", "BUTTON"].includes(t.tagName));
    const down = (e: KeyboardEvent) => {
      if (e.code === "Space" && !typing(e.target)) {
        space.current = true;
        e.preventDefault();
      }
    };
    const up = (e: KeyboardEvent) => {
      if (e.code === "Space") space.current = false;
    };
    window.addEventListener("keydown", down);
    window.addEventListener("keyup", up);
    return () => {
      window.removeEventListener("keydown", down);
      window.removeEventListener("keyup", up);
    };
  }, []);

  const sectionIndex = useMemo(() => new Map(doc.sections.map((s, i) => [s.id, i] as const)), [doc.sections]);

  const local = (e: React.PointerEvent): Point => {
    const rect = wrapper.current!.getBoundingClientRect();
    return { x: e.clientX - rect.left, y: e.clientY - rect.top };
  };

  /** What is under a screen point: a section, a jump marker, or nothing; null for a draggable. */
  const hitAt = (p: Point): Selection | "empty" | null => {
    const node = stageRef.current?.getIntersection(p);
    for (let n: Konva.Node | null = node ?? null; n; n = n.getParent()) {
      if (n.draggable()) return null;
      const m = /(?:^| )(section|verdict)-(\d+)/.exec(n.name());
      if (m) return { kind: "section", index: Number(m[2]) };
    }
    return "empty";
  };

  const onPointerDown = (e: React.PointerEvent) => {
    if (e.button !== 0 || !view) return;
    const p = local(e);
    const target = space.current ? "empty" : hitAt(p);
    if (target === null) return; // a handle or marker: konva drags it
    wrapper.current?.setPointerCapture(e.pointerId);
    const photo = editable && mode === "move-photo" && !!doc.background && !space.current;
    if (photo) photoGesture.current = `photo-${Date.now()}`;
    press.current = { x: p.x, y: p.y, lastX: p.x, lastY: p.y, moved: false, target, photo };
  };

  const onPointerMove = (e: React.PointerEvent) => {
    const pr = press.current;
    if (!pr || !view) return;
    const p = local(e);
    if (!pr.moved && Math.hypot(p.x - pr.x, p.y - pr.y) < 4) return;
    pr.moved = true;
    const dx = p.x - pr.lastX;
    const dy = p.y - pr.lastY;
    pr.lastX = p.x;
    pr.lastY = p.y;
    if (pr.photo && doc.background) {
      props.onChange(
        { ...doc, background: moveBackground(doc.background, dx / view.scale, -dy / view.scale) },
        photoGesture.current,
        { kind: "photo" },
      );
    } else {
      setView((v) => (v ? panBy(v, dx, dy) : v));
    }
  };

  const onPointerUp = (e: React.PointerEvent) => {
    const pr = press.current;
    press.current = null;
    if (!pr || !view) return;
    if (pr.moved) {
      if (pr.photo) props.onGestureEnd();
      return;
    }
    if (mode !== "select" && mode !== "move-photo" && editable) {
      props.onPlanClick(screenToWorld(view, local(e)));
      return;
    }
    props.onSelect(pr.target === "empty" ? null : pr.target);
  };

  const selectedSection = selection?.kind === "section" ? selection.index : null;
  const showLabels = !!view && view.scale * doc.trackWidth > 14;
  const cursor = mode === "select" ? "default" : mode === "move-photo" ? "move" : "crosshair";

  return (
    <div
      ref={wrapper}
      className="absolute inset-0 touch-none overflow-hidden bg-sand-50 select-none"
      style={{ cursor }}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={() => (press.current = null)}
      data-testid="plan-canvas"
    >
      {view && size.width ? (
        <Stage
          ref={stageRef}
          width={size.width}
          height={size.height}
          onDragStart={() => setDragging(true)}
          onDragEnd={() => setDragging(false)}
        >
          <Layer listening={false}>
            <GridShape view={view} width={size.width} height={size.height} units={props.units} />
            <Group x={view.ox} y={view.oy} scaleX={view.scale} scaleY={-view.scale}>
              {props.photoUrl && doc.background ? (
                <PhotoImage url={props.photoUrl} background={doc.background} onSize={props.onPhotoSize} />
              ) : null}
              {doc.siteBoundary ? (
                <Line
                  points={doc.siteBoundary.flat()}
                  closed
                  stroke={PLAN.boundary}
                  strokeWidth={2}
                  dash={[10, 6]}
                  strokeScaleEnabled={false}
                />
              ) : null}
            </Group>
          </Layer>
          <Layer listening={!dragging}>
            <Group x={view.ox} y={view.oy} scaleX={view.scale} scaleY={-view.scale}>
              {sections.map((r, i) => (
                <SectionShape
                  key={doc.sections[i].id}
                  section={doc.sections[i]}
                  index={i}
                  trackWidth={doc.trackWidth}
                  x={r.start.x}
                  y={r.start.y}
                  headingDeg={r.start.heading * RAD}
                  selected={selectedSection === i}
                  scale={view.scale}
                  showLabel={showLabels}
                />
              ))}
            </Group>
          </Layer>
          <Layer listening={false}>
            {overlay ? <OverlayShape overlay={overlay} view={view} stale={props.overlayStale} /> : null}
          </Layer>
          <Layer>
            <StartMarker doc={doc} view={view} />
            {overlay ? (
              <VerdictMarkers
                jumps={overlay.jumps}
                sectionIndex={sectionIndex}
                view={view}
                selectedIndex={selectedSection}
              />
            ) : null}
            <SiteMarkers
              doc={doc}
              view={view}
              selection={selection}
              editable={editable}
              snap={props.snap}
              onSelect={props.onSelect}
              onChange={props.onChange}
              onGestureEnd={props.onGestureEnd}
            />
            {editable && selectedSection !== null && sections[selectedSection] ? (
              <SectionHandles
                doc={doc}
                resolved={sections[selectedSection]}
                index={selectedSection}
                view={view}
                snap={props.snap}
                units={props.units}
                onChange={props.onChange}
                onGestureEnd={props.onGestureEnd}
              />
            ) : null}
            <CalibrationMarks points={props.calibrationPoints} view={view} />
          </Layer>
        </Stage>
      ) : null}
      {view ? <ScaleBar scale={view.scale} units={props.units} /> : null}
      {overlay ? <SpeedLegend overlay={overlay} stale={props.overlayStale} /> : null}
      <ZoomControls
        onZoom={(f) => setView((v) => (v ? zoomAt(v, { x: size.width / 2, y: size.height / 2 }, f) : v))}
        onFit={fit}
      />
    </div>
  );
}
