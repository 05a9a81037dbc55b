import { placeDriverStand, removeDriverStand, setTrackWidth } from "~/lib/editor/site-ops";
import { feetHint } from "~/lib/editor/units";
import { toolClass } from "./editor-toolbar";
import { NumberField } from "./number-field";
import { BoundarySection, inRange, MarshalSection, siteTools, type SiteProps } from "./site-sections";

/** Track width, driver stand, marshal points and site boundary. */
export function SitePanel(p: SiteProps) {
  const { doc, onChange, onGestureEnd } = p;
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

      <StandSection {...p} />

      <MarshalSection {...p} />

      <BoundarySection {...p} />
    </div>
  );
}

/** The driver stand: place it by a click, type its position and the drivers' eye height. */
export function StandSection(p: SiteProps) {
  const { doc, mode, onChange, onGestureEnd } = p;
  const { toggle, pressed, coord } = siteTools(p);
  return (
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
  );
}
