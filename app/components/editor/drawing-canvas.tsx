/**
 * The plan canvas (konva). Loaded lazily and only in the browser, by the editor and the plan view:
 * konva lives in this chunk alone. Layers, from the back: grid, photo and site boundary (never
 * listening); the marshal zones (never listening); the track (one memoised group per section); the
 * analysis overlay and the hotspots; markers and handles in screen space. A drag redraws the track and handle layers only. The view and the
 * pointer gestures live in canvas/use-canvas-view.ts and canvas/use-canvas-pointer.ts.
 */
import { useState } from "react";
import { Layer, Stage } from "react-konva";
import type { DrawingCanvasProps } from "./canvas-types";
import { ScaleBar, SpeedLegend, ZoneKey, ZoomControls } from "./canvas-overlays";
import { HotspotMarks, MarshalZonesLayer } from "~/components/editor/canvas/marshal-layers";
import { GhostLine, OverlayShape } from "~/components/editor/canvas/overlay-shape";
import { BackdropLayer, MarkerLayer, TrackLayer } from "~/components/editor/canvas/plan-layers";
import { useCanvasPointer } from "~/components/editor/canvas/use-canvas-pointer";
import { useCanvasView } from "~/components/editor/canvas/use-canvas-view";

export default function DrawingCanvas(props: DrawingCanvasProps) {
  const { doc, sections, selection, mode, overlay } = props;
  const { wrapper, size, view, setView, fit, zoomBy } = useCanvasView(doc, sections, props.fitRequest);
  const { stageRef, handlers } = useCanvasPointer(props, wrapper, view, setView);
  /** While a handle is dragged the track layer skips its hit canvas (nothing can be clicked then). */
  const [dragging, setDragging] = useState(false);

  const selectedSection = selection?.kind === "section" ? selection.index : null;
  const cursor = mode === "select" ? "default" : mode === "move-photo" ? "move" : "crosshair";

  return (
    <div
      ref={wrapper}
      className="absolute inset-0 touch-none overflow-hidden bg-sand-50 select-none"
      style={{ cursor }}
      {...handlers}
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
          <BackdropLayer
            doc={doc}
            view={view}
            width={size.width}
            height={size.height}
            units={props.units}
            photoUrl={props.photoUrl}
            onPhotoSize={props.onPhotoSize}
          />
          <MarshalZonesLayer marshal={props.marshal ?? null} view={view} />
          <TrackLayer
            doc={doc}
            sections={sections}
            view={view}
            selectedSection={selectedSection}
            listening={!dragging}
          />
          <Layer listening={false}>
            {overlay ? <OverlayShape overlay={overlay} view={view} stale={props.overlayStale} /> : null}
            <HotspotMarks marshal={props.marshal ?? null} view={view} />
            {props.ghost ? <GhostLine line={props.ghost} view={view} /> : null}
          </Layer>
          <MarkerLayer props={props} view={view} size={size} selectedSection={selectedSection} />
        </Stage>
      ) : null}
      {view ? <ScaleBar scale={view.scale} units={props.units} /> : null}
      {props.marshal ? (
        <ZoneKey stale={props.marshal.stale} hotspots={props.marshal.hotspots.length > 0} />
      ) : null}
      {overlay ? <SpeedLegend overlay={overlay} stale={props.overlayStale} /> : null}
      <ZoomControls onZoom={zoomBy} onFit={fit} />
    </div>
  );
}
