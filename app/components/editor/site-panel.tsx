import type { Selection } from "~/lib/editor/editor-state";
import {
  moveBoundaryPoint,
  moveMarshalPoint,
  placeDriverStand,
  removeBoundary,
  removeDriverStand,
  setTrackWidth,
  type Bounds,
  rectangleBoundary,
} from "~/lib/editor/site-ops";
import { feetHint } from "~/lib/editor/units";
import type { LayoutDocument } from "~/analysis";
import type { CanvasMode } from "./canvas-types";
import { toolClass } from "./editor-toolbar";
import { NumberField } from "./number-field";

interface Props {
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

const inRange = (v: number, min: number, max: number, unit: string) =>
  v < min ? `must be at least ${min} ${unit}` : v > max ? `must be at most ${max} ${unit}` : null;

/** Track width, driver stand, marshal points and site boundary. */
export function SitePanel({ doc, selection, mode, bounds, onMode, onChange, onSelect, onGestureEnd }: Props) {
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
  const m = selection?.kind === "marshal" ? doc.marshalPoints[selection.index] : undefined;
  const corner = selection?.kind === "boundary" ? doc.siteBoundary?.[selection.index] : undefined;
  return (
    <div className="space-y-4 text-sm">
      <NumberField
        label="Track width"
        unit="m"
        value={doc.trackWidth}
        hint={`${feetHint(doc.trackWidth)} · guidance asks at least 2.4 m (3 m at national level)`}
        onValue={(v) => inRange(v, 1, 10, "m") ?? (onChange(setTrackWidth(doc, v), "track-width"), null)}
        onDone={onGestureEnd}
      />

      <section className="space-y-2" aria-labelledby="stand-heading">
        <h3 id="stand-heading" className="font-semibold">
          Driver stand
        </h3>
        {doc.driverStand ? (
          <>
            <div className="grid grid-cols-3 gap-2">
              {coord(
                "x",
                doc.driverStand.x,
                (v) => placeDriverStand(doc, { x: v, y: doc.driverStand!.y }),
                "stand-x",
              )}
              {coord(
                "y",
                doc.driverStand.y,
                (v) => placeDriverStand(doc, { x: doc.driverStand!.x, y: v }),
                "stand-y",
              )}
              <NumberField
                label="Eye height"
                unit="m"
                value={doc.driverStand.eyeHeight}
                onValue={(v) =>
                  inRange(v, 0.5, 15, "m") ??
                  (onChange(placeDriverStand(doc, doc.driverStand!, v), "stand-eye"), null)
                }
                onDone={onGestureEnd}
              />
            </div>
            <div className="flex flex-wrap gap-1.5">
              <button
                type="button"
                className={toolClass + pressed("stand")}
                aria-pressed={mode === "stand"}
                onClick={() => toggle("stand")}
              >
                {mode === "stand" ? "Click the plan…" : "Move by clicking the plan"}
              </button>
              <button
                type="button"
                className={toolClass}
                onClick={() => onChange(removeDriverStand(doc), undefined, null)}
              >
                Remove the stand
              </button>
            </div>
          </>
        ) : (
          <button
            type="button"
            className={toolClass + pressed("stand")}
            aria-pressed={mode === "stand"}
            onClick={() => toggle("stand")}
          >
            {mode === "stand" ? "Click the plan where the stand is…" : "Place the driver stand"}
          </button>
        )}
      </section>

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
            {doc.marshalPoints.map((p, i) => (
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
              Marshal point {selection.index + 1}: drag it on the plan, or type its position. Delete removes
              it.
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

      <section className="space-y-2" aria-labelledby="boundary-heading">
        <h3 id="boundary-heading" className="font-semibold">
          Site boundary
        </h3>
        {doc.siteBoundary ? (
          <>
            <p className="text-xs text-ink-500">
              {doc.siteBoundary.length} corners. Drag a corner to move it; click beside an edge to add a
              corner there.
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
    </div>
  );
}
