/**
 * The plan canvas's konva layers, from the back: the backdrop (grid, photo, site boundary; never
 * listening), the track (one memoised shape per section) and the markers and handles in screen
 * space. The analysis overlay's layer sits between the track and the markers (drawing-canvas.tsx).
 */
import { useMemo } from "react";
import { Group, Layer, Line } from "react-konva";
import type { LayoutDocument, ResolvedSection } from "~/analysis";
import type { View } from "~/lib/editor/view";
import type { LengthUnit } from "~/lib/editor/units";
import type { DrawingCanvasProps } from "../canvas-types";
import { PLAN } from "../colours";
import { GridShape } from "./grid-shape";
import { LabelLayerContent } from "./label-layer";
import { PhotoImage } from "./photo-image";
import { SectionHandles } from "./section-handles";
import { SectionShape } from "./section-shape";
import { SiteMarkers, StartMarker } from "./site-markers";
import { CalibrationMarks, VerdictMarkers } from "./verdict-markers";

const RAD = 180 / Math.PI;

/** The grid in screen space, then the site photo and the site boundary in plan metres. */
export function BackdropLayer({
  doc,
  view,
  width,
  height,
  units,
  photoUrl,
  onPhotoSize,
}: {
  doc: LayoutDocument;
  view: View;
  width: number;
  height: number;
  units: LengthUnit;
  photoUrl: string | null;
  onPhotoSize?(width: number, height: number): void;
}) {
  return (
    <Layer listening={false}>
      <GridShape view={view} width={width} height={height} units={units} />
      <Group x={view.ox} y={view.oy} scaleX={view.scale} scaleY={-view.scale}>
        {photoUrl && doc.background ? (
          <PhotoImage url={photoUrl} background={doc.background} onSize={onPhotoSize} />
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
  );
}

/**
 * The track, one memoised shape per section in plan metres (their numbers are labels of the
 * marker layer). Not listening while a handle is dragged (nothing can be clicked then).
 */
export function TrackLayer({
  doc,
  sections,
  view,
  selectedSection,
  listening,
}: {
  doc: LayoutDocument;
  sections: ResolvedSection[];
  view: View;
  selectedSection: number | null;
  listening: boolean;
}) {
  return (
    <Layer listening={listening}>
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
          />
        ))}
      </Group>
    </Layer>
  );
}

/**
 * Screen-space markers: the start, the jumps' verdict marks, the stand, marshal points and boundary
 * corners, the selected section's handles (when editable), the calibration points and every label
 * (placed together by the label placer, label-layer.tsx).
 */
export function MarkerLayer({
  props,
  view,
  size,
  selectedSection,
}: {
  props: DrawingCanvasProps;
  view: View;
  size: { width: number; height: number };
  selectedSection: number | null;
}) {
  const { doc, sections, selection, editable, overlay } = props;
  const sectionIndex = useMemo(() => new Map(doc.sections.map((s, i) => [s.id, i] as const)), [doc.sections]);
  return (
    <Layer>
      <StartMarker doc={doc} view={view} />
      {overlay ? <VerdictMarkers jumps={overlay.jumps} sectionIndex={sectionIndex} view={view} /> : null}
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
          onChange={props.onChange}
          onGestureEnd={props.onGestureEnd}
        />
      ) : null}
      <CalibrationMarks points={props.calibrationPoints} view={view} />
      <LabelLayerContent
        doc={doc}
        sections={sections}
        view={view}
        width={size.width}
        height={size.height}
        overlay={overlay}
        selectedSection={selectedSection}
        editable={editable}
        units={props.units}
        calibrationPoints={props.calibrationPoints}
        marshal={props.marshal ?? null}
      />
    </Layer>
  );
}
