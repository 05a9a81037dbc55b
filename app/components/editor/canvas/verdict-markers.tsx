import { Group, Line, Path } from "react-konva";
import type { OverlayJump } from "~/analysis";
import type { Point } from "~/lib/editor/drag-maths";
import { worldToScreen, type View } from "~/lib/editor/view";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";
import { PLAN } from "../colours";
import { jumpMarkAt, SYMBOL } from "./canvas-labels";

/** Size of a marker's shape on screen: its path (about 1 unit in radius) times this, px. */
const MARK_SCALE = SYMBOL.mark - 1;

/**
 * A mark on each jump's lip, as on the layout page's drawing: the verdict's mark
 * (app/lib/verdict-marks.ts: triangle, circle or cross) and, when it lands, its flight to the
 * touchdown as a dashed line. Its J number and the verdict's words are labels of the label layer
 * (canvas-labels.ts), so the shape and the words carry the verdict, not the colour alone.
 */
export function VerdictMarkers({
  jumps,
  sectionIndex,
  view,
}: {
  jumps: OverlayJump[];
  sectionIndex: Map<string, number>;
  view: View;
}) {
  return (
    <>
      {jumps.map((j) => {
        const index = sectionIndex.get(j.sectionId);
        if (index === undefined) return null;
        const lip = worldToScreen(view, jumpMarkAt(j));
        const colour = PLAN.verdict[j.verdict];
        return (
          <Group key={j.sectionId} name={`verdict verdict-${index}`} listening={false}>
            {j.landing ? (
              <Line
                points={[lip.x, lip.y, ...xy(worldToScreen(view, { x: j.landing[0], y: j.landing[1] }))]}
                stroke={colour}
                strokeWidth={1.5}
                dash={[3, 3]}
              />
            ) : null}
            <Path
              x={lip.x}
              y={lip.y}
              name={`mark-${VERDICT_MARKS[j.verdict].shape}`}
              data={VERDICT_MARKS[j.verdict].path}
              scaleX={MARK_SCALE}
              scaleY={MARK_SCALE}
              fill={colour}
              stroke="#ffffff"
              strokeWidth={VERDICT_MARK_OUTLINE}
            />
          </Group>
        );
      })}
    </>
  );
}

function xy(p: Point): [number, number] {
  return [p.x, p.y];
}

/** The calibration points picked on the photo (their numbers are labels), joined by a line. */
export function CalibrationMarks({ points, view }: { points: Point[]; view: View }) {
  const s = points.map((p) => worldToScreen(view, p));
  return (
    <Group listening={false}>
      {s.length === 2 ? (
        <Line
          points={[s[0].x, s[0].y, s[1].x, s[1].y]}
          stroke={PLAN.selected}
          strokeWidth={2}
          dash={[6, 4]}
        />
      ) : null}
      {s.map((p, k) => (
        <Group key={k} x={p.x} y={p.y}>
          <Line points={[-10, 0, 10, 0]} stroke={PLAN.selected} strokeWidth={2} />
          <Line points={[0, -10, 0, 10]} stroke={PLAN.selected} strokeWidth={2} />
        </Group>
      ))}
    </Group>
  );
}
