import { Group, Label, Line, Path, Tag, Text } from "react-konva";
import type { OverlayJump } from "~/analysis";
import type { Point } from "~/lib/editor/drag-maths";
import { worldToScreen, type View } from "~/lib/editor/view";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";
import { PLAN } from "../colours";

/** Size of a marker's shape on screen: its path (about 1 unit in radius) times this, px. */
const MARK_SCALE = 9;

/**
 * A marker on each jump's landing (or its lip when it cannot be cleared): the verdict's mark
 * (app/lib/verdict-marks.ts: triangle, circle or cross, as on the pages) with its short text, so
 * the shape and the text carry the verdict, not the colour alone. The flight from lip to landing
 * is a dashed line. Clicking selects the jump.
 */
export function VerdictMarkers({
  jumps,
  sectionIndex,
  view,
  selectedIndex,
}: {
  jumps: OverlayJump[];
  sectionIndex: Map<string, number>;
  view: View;
  selectedIndex: number | null;
}) {
  return (
    <>
      {jumps.map((j) => {
        const index = sectionIndex.get(j.sectionId);
        if (index === undefined) return null;
        const lip = worldToScreen(view, { x: j.lip[0], y: j.lip[1] });
        const at: Point = j.landing ? worldToScreen(view, { x: j.landing[0], y: j.landing[1] }) : lip;
        const colour = PLAN.verdict[j.verdict];
        const selected = index === selectedIndex;
        return (
          <Group key={j.sectionId} name={`verdict verdict-${index}`}>
            {j.landing ? (
              <Line
                points={[lip.x, lip.y, at.x, at.y]}
                stroke={colour}
                strokeWidth={1.5}
                dash={[3, 3]}
                listening={false}
              />
            ) : null}
            <Group x={at.x} y={at.y} name={`verdict-${index}`}>
              <Path
                name={`mark-${VERDICT_MARKS[j.verdict].shape}`}
                data={VERDICT_MARKS[j.verdict].path}
                scaleX={MARK_SCALE}
                scaleY={MARK_SCALE}
                fill={colour}
                stroke="#ffffff"
                strokeWidth={VERDICT_MARK_OUTLINE}
              />
              <Label x={13} y={-9}>
                <Tag
                  fill={selected ? PLAN.selected : "rgba(251, 249, 245, 0.95)"}
                  stroke={colour}
                  strokeWidth={1}
                  cornerRadius={3}
                />
                <Text
                  text={shorten(j.label)}
                  fontSize={11}
                  fontStyle="600"
                  fontFamily="Inter, sans-serif"
                  padding={3}
                  fill={selected ? "#ffffff" : colour}
                />
              </Label>
            </Group>
          </Group>
        );
      })}
    </>
  );
}

function shorten(text: string): string {
  return text.length > 48 ? `${text.slice(0, 47)}…` : text;
}

/** The calibration points picked on the photo, numbered, joined by a line. */
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
          <Text
            x={6}
            y={-18}
            text={String(k + 1)}
            fontSize={13}
            fontStyle="700"
            fontFamily="Inter, sans-serif"
            fill={PLAN.selected}
          />
        </Group>
      ))}
    </Group>
  );
}
