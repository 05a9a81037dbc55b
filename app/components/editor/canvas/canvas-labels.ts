/**
 * Every text label of the plan canvas, as requests to the one label placer (app/lib/label-placer.ts):
 * section numbers, the start, the driver stand, M and J numbers, the verdicts' words, the
 * analysis's notes (hidden stretches, lanes too close), the hotspot numbers, the handles' readouts
 * and the calibration points; with the symbols and the buttons over the canvas as obstacles. Screen pixels, y down.
 */
import { advancePose, type AnalysisOverlay, type LayoutDocument, type ResolvedSection } from "~/analysis";
import { jumpMoveBlocker, sectionHandles, type Point } from "~/lib/editor/drag-maths";
import { HOTSPOT_MARK_PX, hotspotMarks } from "~/lib/editor/marshal-drawing";
import { formatLength, type LengthUnit } from "~/lib/editor/units";
import { worldToScreen, type View } from "~/lib/editor/view";
import type { Box, LabelPosition, LabelRequest } from "~/lib/label-placer";
import type { CanvasMarshal } from "../canvas-types";
import { PLAN } from "../colours";

export type LabelKind =
  | "section"
  | "start"
  | "stand"
  | "marshal"
  | "jump"
  | "verdict"
  | "hidden"
  | "conflict"
  | "hotspot"
  | "tip"
  | "calibration";

export interface CanvasLabel extends LabelRequest {
  kind: LabelKind;
  text: string;
  font: LabelFont;
  /** Text colour, and the outline of its tag. */
  colour: string;
  outline: string;
  /** The tag's fill. */
  fill: string;
}

export interface LabelFont {
  size: number;
  weight: "normal" | "600" | "700";
}

/** Space inside a label's tag, px. */
export const LABEL_PADDING = 3;
const PAPER = "rgba(251, 249, 245, 0.92)";
const PRIORITY: Record<LabelKind, number> = {
  calibration: 120,
  tip: 110,
  jump: 100,
  marshal: 90,
  start: 80,
  stand: 70,
  conflict: 60,
  hotspot: 58,
  hidden: 55,
  verdict: 50,
  section: 40,
};
/** Half the size of the symbols on screen, px: verdict mark, marshal diamond, stand, handle. */
export const SYMBOL = { mark: 10, marshal: 8, stand: 10, handle: 9 } as const;
const CORNERS: LabelPosition[] = ["above-right", "below-right", "above-left", "below-left", "right", "left"];

export interface CanvasLabelInput {
  doc: LayoutDocument;
  sections: ResolvedSection[];
  view: View;
  width: number;
  height: number;
  overlay: AnalysisOverlay | null;
  selectedSection: number | null;
  editable: boolean;
  units: LengthUnit;
  calibrationPoints: Point[];
  /** The marshal zones and hotspots drawn (their key is shown above the scale bar), or null. */
  marshal?: CanvasMarshal | null;
  /** Width of a text in a font, px. */
  measure(text: string, font: LabelFont): number;
}

/** Where the verdict marks sit: the lip of each jump (as on the layout page's drawing). */
export function jumpMarkAt(j: AnalysisOverlay["jumps"][number]): Point {
  return { x: j.lip[0], y: j.lip[1] };
}

/** The middle of a section on its centre line, m. */
export function sectionMiddle(r: ResolvedSection): Point {
  const p = advancePose(r.start, r.length / 2, r.curvature);
  return { x: p.x, y: p.y };
}

/** The label requests and the obstacles of one canvas drawing. */
export function canvasLabels(input: CanvasLabelInput): { labels: CanvasLabel[]; obstacles: Box[] } {
  const { doc, view, overlay, measure } = input;
  const labels: CanvasLabel[] = [];
  const obstacles: Box[] = overlayObstacles(input);
  const at = (p: Point) => worldToScreen(view, p);
  const add = (
    kind: LabelKind,
    id: string,
    text: string,
    anchor: Point,
    offset: number,
    o: Partial<Pick<CanvasLabel, "colour" | "outline" | "fill" | "priority" | "positions">> & {
      font?: LabelFont;
    } = {},
  ) => {
    const font = o.font ?? { size: 11, weight: "600" };
    labels.push({
      kind,
      id: `${kind}-${id}`,
      text,
      anchor,
      offset,
      font,
      width: Math.ceil(measure(text, font)) + 2 * LABEL_PADDING,
      height: font.size + 2 * LABEL_PADDING,
      priority: o.priority ?? PRIORITY[kind],
      positions: o.positions,
      colour: o.colour ?? PLAN.text,
      outline: o.outline ?? PLAN.bandEdge,
      fill: o.fill ?? PAPER,
    });
  };
  const square = (p: Point, half: number) =>
    obstacles.push({ x: p.x - half, y: p.y - half, width: 2 * half, height: 2 * half });
  const halfWidth = (doc.trackWidth / 2) * view.scale;

  add("start", "0", "Start", at(doc.start), Math.min(halfWidth, 40) + 4, {
    font: { size: 11, weight: "700" },
  });
  if (doc.driverStand) {
    const p = at(doc.driverStand);
    square(p, SYMBOL.stand);
    add("stand", "0", "Driver stand", p, SYMBOL.stand + 3, { colour: PLAN.stand });
  }
  doc.marshalPoints.forEach((m, i) => {
    const p = at(m);
    square(p, SYMBOL.marshal);
    add("marshal", String(i), `M${i + 1}`, p, SYMBOL.marshal + 3, { font: { size: 11, weight: "700" } });
  });
  overlay?.jumps.forEach((j, k) => {
    const p = at(jumpMarkAt(j));
    square(p, SYMBOL.mark);
    const colour = PLAN.verdict[j.verdict];
    const selected =
      input.selectedSection !== null && doc.sections[input.selectedSection]?.id === j.sectionId;
    add("jump", j.sectionId, `J${k + 1}`, p, SYMBOL.mark + 3, {
      font: { size: 11, weight: "700" },
      outline: colour,
      ...(selected ? { fill: PLAN.selected, colour: "#ffffff" } : {}),
    });
    add("verdict", j.sectionId, shorten(j.label), p, SYMBOL.mark + 3, { colour, outline: colour });
  });
  overlay?.hidden.forEach((h, i) => {
    if (h.points.length < 2) return;
    const [x, y] = h.points[Math.floor(h.points.length / 2)];
    add("hidden", String(i), `Hidden from the stand (${h.length.toFixed(0)} m)`, at({ x, y }), 6, {
      colour: PLAN.hidden,
    });
  });
  overlay?.laneConflicts.forEach((c, i) => {
    const mid = { x: (c.a[0] + c.b[0]) / 2, y: (c.a[1] + c.b[1]) / 2 };
    add("conflict", String(i), `Lanes ${c.distance.toFixed(1)} m apart`, at(mid), 4, {
      colour: PLAN.conflict,
      outline: PLAN.conflict,
    });
  });
  if (input.marshal)
    for (const g of hotspotMarks(input.marshal.hotspots, view)) {
      square(g, HOTSPOT_MARK_PX);
      add("hotspot", g.ids[0], g.ids.join(","), g, HOTSPOT_MARK_PX + 2, {
        font: { size: 10, weight: "600" },
      });
    }
  sectionNumbers(input, add, halfWidth);
  if (input.editable) handleTips(input, add, square);
  input.calibrationPoints.forEach((p, k) =>
    add("calibration", String(k), String(k + 1), at(p), 10, {
      colour: PLAN.selected,
      outline: PLAN.selected,
      font: { size: 13, weight: "700" },
    }),
  );
  return { labels, obstacles };
}

type Add = (
  kind: LabelKind,
  id: string,
  text: string,
  anchor: Point,
  offset: number,
  o?: Partial<Pick<CanvasLabel, "colour" | "outline" | "fill" | "priority" | "positions">> & {
    font?: LabelFont;
  },
) => void;

/** Section numbers beside their middles, when a lane is wide enough on screen (the selected one always). */
function sectionNumbers(input: CanvasLabelInput, add: Add, halfWidth: number) {
  const { doc, sections, view, selectedSection } = input;
  const all = view.scale * doc.trackWidth > 14;
  sections.forEach((r, i) => {
    const selected = i === selectedSection;
    if (!all && !selected) return;
    add(
      "section",
      doc.sections[i].id,
      String(i + 1),
      worldToScreen(view, sectionMiddle(r)),
      Math.min(halfWidth, 30) + 3,
      {
        font: { size: 11, weight: selected ? "700" : "normal" },
        ...(selected ? { fill: PLAN.selected, colour: "#ffffff", priority: 95 } : {}),
      },
    );
  });
}

/** The selected section's handle readouts (length, radius, angle) beside their handles. */
function handleTips(input: CanvasLabelInput, add: Add, square: (p: Point, half: number) => void) {
  const { doc, sections, view, selectedSection: i, units } = input;
  if (i === null || !sections[i] || !doc.sections[i]) return;
  const s = doc.sections[i];
  const h = sectionHandles(sections[i], s, jumpMoveBlocker(doc, i) === null);
  const tip = (id: string, p: Point | undefined, text: string) => {
    if (!p) return;
    const at = worldToScreen(view, p);
    square(at, SYMBOL.handle);
    add("tip", id, text, at, SYMBOL.handle + 3, {
      colour: PLAN.handleStroke,
      outline: PLAN.handleStroke,
      font: { size: 12, weight: "600" },
      positions: CORNERS,
    });
  };
  if (s.kind === "straight") tip("end", h.end, formatLength(s.length, units));
  if (s.kind === "turn") {
    tip("radius", h.centre, `R ${formatLength(s.radius, units)}`);
    tip("angle", h.angle, `${s.angleDeg.toFixed(0)}°`);
  }
  if (s.kind === "jump") tip("move", h.move, "Move along the track");
}

/** The buttons, the scale bar, the speed legend and the zone key drawn over the canvas: no label under them. */
function overlayObstacles(input: CanvasLabelInput): Box[] {
  const { width, height, overlay } = input;
  const out: Box[] = [
    { x: width - 140, y: 0, width: 140, height: 46 },
    { x: 0, y: height - 50, width: 150, height: 50 },
  ];
  if (overlay) out.push({ x: width - 180, y: height - 100, width: 180, height: 100 });
  if (input.marshal) out.push({ x: 0, y: height - 110, width: 240, height: 60 });
  return out;
}

function shorten(text: string): string {
  return text.length > 48 ? `${text.slice(0, 47)}…` : text;
}
