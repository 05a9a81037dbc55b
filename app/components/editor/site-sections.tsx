/**
 * The site panel's parts (the driver stand is in site-panel.tsx): the marshal points and the site
 * boundary, placed by clicks on the plan (a canvas mode) or typed in plan metres; and their helpers.
 */
import type { Selection } from "~/lib/editor/editor-state";
import {
  moveBoundaryPoint,
  moveMarshalPoint,
  removeBoundary,
  type Bounds,
  rectangleBoundary,
} from "~/lib/editor/site-ops";
import type { LayoutDocument } from "~/analysis";
import type { CanvasMode } from "./canvas-types";
import { toolClass } from "./editor-toolbar";
import { NumberField } from "./number-field";

export interface SiteProps {
  doc: LayoutDocument;
  selection: Selection;
  mode: CanvasMode;
  /** The layout's extent, m (worked out only when a boundary is drawn). */
  bounds(): Bounds;
  onMode(mode: CanvasMode): void;
  onChange(doc: LayoutDocument, gesture?: string, selection?: Selection): void;
  onSelect(selection: Selection): void;
  onGestureEnd(): void;
}

export const inRange = (v: number, min: number, max: number, unit: string) =>
  v < min ? `must be at least ${min} ${unit}` : v > max ? `must be at most ${max} ${unit}` : null;

/** The parts' shared helpers: toggle a placing mode, its pressed look, and a coordinate field. */
export function siteTools({ mode, onMode, onChange, onGestureEnd }: SiteProps) {
  const toggle = (m: CanvasMode) => onMode(mode === m ? "select" : m);
  const pressed = (m: CanvasMode) => (mode === m ? " bg-clay-100 border-clay-500" : "");
  const coord = (label: string, value: number, set: (v: number) => LayoutDocument, gesture: string) => (
    <NumberField
      label={label}
      unit="m"
      value={value}
      decimals={2}
      onValue={(v) => inRange(v, -10000, 10000, "m") ?? (onChange(set(v), gesture), null)}
      onDone={onGestureEnd}
    />
  );
  return { toggle, pressed, coord };
}

/** Marshal points: add them by clicks, select one to type its position. */
export function MarshalSection(p: SiteProps) {
  const { doc, selection, mode, onSelect } = p;
  const { toggle, pressed, coord } = siteTools(p);
  const m = selection?.kind === "marshal" ? doc.marshalPoints[selection.index] : undefined;
  return (
    <section className="space-y-2" aria-labelledby="marshal-heading">
      <h3 id="marshal-heading" className="font-semibold">
        Marshal points ({doc.marshalPoints.length})
      </h3>
      <button
        type="button"
        className={toolClass + pressed("marshal")}
        aria-pressed={mode === "marshal"}
        onClick={() => toggle("marshal")}
      >
        {mode === "marshal" ? "Click the plan to add… (Escape to stop)" : "Add marshal points"}
      </button>
      {doc.marshalPoints.length ? (
        <ol className="flex flex-wrap gap-1">
          {doc.marshalPoints.map((_point, i) => (
            <li key={i}>
              <button
                type="button"
                aria-current={selection?.kind === "marshal" && selection.index === i ? "true" : undefined}
                className="rounded-full border border-clay-500 px-2 py-0.5 text-xs tabular-nums aria-[current=true]:bg-clay-500 aria-[current=true]:text-white"
                onClick={() => onSelect({ kind: "marshal", index: i })}
              >
                {i + 1}
              </button>
            </li>
          ))}
        </ol>
      ) : null}
      {m && selection?.kind === "marshal" ? (
        <div className="grid grid-cols-2 gap-2">
          <p className="col-span-2 text-xs text-ink-500">
            Marshal point {selection.index + 1}: drag it on the plan, or type its position. Delete removes it.
          </p>
          {coord(
            "x",
            m.x,
            (v) => moveMarshalPoint(doc, selection.index, { x: v, y: m.y }),
            `marshal-${selection.index}-x`,
          )}
          {coord(
            "y",
            m.y,
            (v) => moveMarshalPoint(doc, selection.index, { x: m.x, y: v }),
            `marshal-${selection.index}-y`,
          )}
        </div>
      ) : null}
    </section>
  );
}

/** The site boundary: a rectangle around the layout to start, corners dragged or typed, more added by clicks. */
export function BoundarySection(p: SiteProps) {
  const { doc, selection, mode, bounds, onChange } = p;
  const { toggle, pressed, coord } = siteTools(p);
  const corner = selection?.kind === "boundary" ? doc.siteBoundary?.[selection.index] : undefined;
  return (
    <section className="space-y-2" aria-labelledby="boundary-heading">
      <h3 id="boundary-heading" className="font-semibold">
        Site boundary
      </h3>
      {doc.siteBoundary ? (
        <>
          <p className="text-xs text-ink-500">
            {doc.siteBoundary.length} corners. Drag a corner to move it; click beside an edge to add a corner
            there.
          </p>
          <div className="flex flex-wrap gap-1.5">
            <button
              type="button"
              className={toolClass + pressed("boundary")}
              aria-pressed={mode === "boundary"}
              onClick={() => toggle("boundary")}
            >
              {mode === "boundary" ? "Click beside an edge…" : "Add corners"}
            </button>
            <button
              type="button"
              className={toolClass}
              onClick={() => onChange(removeBoundary(doc), undefined, null)}
            >
              Remove the boundary
            </button>
          </div>
          {corner && selection?.kind === "boundary" ? (
            <div className="grid grid-cols-2 gap-2">
              {coord(
                "Corner x",
                corner[0],
                (v) => moveBoundaryPoint(doc, selection.index, { x: v, y: corner[1] }),
                `corner-${selection.index}-x`,
              )}
              {coord(
                "Corner y",
                corner[1],
                (v) => moveBoundaryPoint(doc, selection.index, { x: corner[0], y: v }),
                `corner-${selection.index}-y`,
              )}
            </div>
          ) : null}
        </>
      ) : (
        <button
          type="button"
          className={toolClass}
          onClick={() => onChange(rectangleBoundary(doc, bounds()))}
        >
          Draw a boundary around the layout
        </button>
      )}
    </section>
  );
}
