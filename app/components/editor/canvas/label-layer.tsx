/**
 * The plan canvas's labels, placed by the one label placer so that none overlaps another, covers a
 * symbol or a button, or leaves the canvas; the least important are dropped first. Each label is a
 * konva Label (a tag and its Text) named "label label-<kind>", never listening.
 */
import { memo, useMemo } from "react";
import { Label, Tag, Text } from "react-konva";
import { placeLabels } from "~/lib/label-placer";
import { canvasLabels, LABEL_PADDING, type CanvasLabelInput, type LabelFont } from "./canvas-labels";

const FAMILY = "Inter, sans-serif";
const widths = new Map<string, number>();
let context: CanvasRenderingContext2D | null = null;

/** Width of a text as konva draws it (its font string), px; remembered per text and font. */
function measure(text: string, font: LabelFont): number {
  const css = `${font.weight} normal ${font.size}px ${FAMILY}`;
  const key = `${css}|${text}`;
  let w = widths.get(key);
  if (w === undefined) {
    context ??= document.createElement("canvas").getContext("2d");
    if (!context) return text.length * font.size * 0.6;
    context.font = css;
    w = context.measureText(text).width;
    widths.set(key, w);
  }
  return w;
}

export const LabelLayerContent = memo(function LabelLayerContent({
  doc,
  sections,
  view,
  width,
  height,
  overlay,
  selectedSection,
  editable,
  units,
  calibrationPoints,
  marshal,
}: Omit<CanvasLabelInput, "measure">) {
  const placed = useMemo(() => {
    const input = { doc, sections, view, width, height, overlay, selectedSection, editable, units, marshal };
    const { labels, obstacles } = canvasLabels({ ...input, calibrationPoints, measure });
    const out = placeLabels(labels, { bounds: { x: 0, y: 0, width, height }, obstacles, gap: 1 });
    const byId = new Map(labels.map((l) => [l.id, l]));
    return out.placed.map((p) => ({ box: p, label: byId.get(p.id)! }));
  }, [
    doc,
    sections,
    view,
    width,
    height,
    overlay,
    selectedSection,
    editable,
    units,
    calibrationPoints,
    marshal,
  ]);
  return (
    <>
      {placed.map(({ box, label }) => (
        <Label key={label.id} x={box.x} y={box.y} name={`label label-${label.kind}`} listening={false}>
          <Tag fill={label.fill} stroke={label.outline} strokeWidth={0.75} cornerRadius={3} />
          <Text
            text={label.text}
            width={box.width}
            height={box.height}
            padding={LABEL_PADDING}
            align="center"
            verticalAlign="middle"
            wrap="none"
            ellipsis
            fontSize={label.font.size}
            fontStyle={label.font.weight}
            fontFamily={FAMILY}
            fill={label.colour}
          />
        </Label>
      ))}
    </>
  );
});
