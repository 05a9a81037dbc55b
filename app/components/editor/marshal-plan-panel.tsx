/**
 * The editor's marshal plan panel (directors only, as the editor is): each marshal point's
 * warnings with what to do and a button that moves it to the engine's nearby safe spot, and
 * "Suggest marshal points", which replaces the points with the engine's suggested set as one
 * undoable edit (Ctrl+Z brings the old points back); the points are then dragged as usual. The
 * "Show marshal zones" tick box shows or hides the zones and hotspots on the plan.
 */
import { useState } from "react";
import { WARNING_KIND_WORDS, type LayoutDocument } from "~/analysis";
import { applySuggested } from "~/lib/editor/marshal-plan-types";
import { moveMarshalPoint } from "~/lib/editor/site-ops";
import type { Selection } from "~/lib/editor/editor-state";
import { toolClass } from "./editor-toolbar";
import type { MarshalPlanState } from "./use-marshal-plan";

type Props = {
  doc: LayoutDocument;
  /** The editor's marshal plan (use-marshal-plan.ts). */
  marshal: MarshalPlanState;
  showZones: boolean;
  onShowZones(show: boolean): void;
  onChange(doc: LayoutDocument, gesture?: string, selection?: Selection): void;
};

export function MarshalPlanPanel({ doc, marshal, showZones, onShowZones, onChange }: Props) {
  const [note, setNote] = useState<string | null>(null);
  const plan = marshal.plan;
  const warned = plan ? plan.points.filter((p) => p.warnings.length > 0) : [];
  const onSuggest = async () => {
    setNote(null);
    const suggested = await marshal.suggest();
    if (!suggested) return;
    if (!suggested.points.length) {
      setNote("The ground beside the track leaves no safe spot within reach: no point was placed.");
      return;
    }
    onChange(applySuggested(doc, suggested.points), undefined, null);
    const fewer =
      suggested.points.length < suggested.asked
        ? ` (${suggested.asked} asked; the ground leaves room for no more)`
        : "";
    const open = suggested.uncovered.length
      ? ` No point covers ${suggested.uncovered.join(", ")}: place one by hand.`
      : "";
    setNote(
      `${suggested.points.length} suggested points placed${fewer}. Drag them to suit the ground; Undo brings the old points back.${open}`,
    );
  };
  return (
    <div className="space-y-3 text-sm" aria-live="polite">
      <p className="text-ink-700">
        Points inside an overshoot or run-off zone, on the track, or farther than the club's reach
        {plan ? ` (${plan.settings.reach} m)` : ""} from the track edge are named here with what to do.
      </p>
      <label className="flex items-center gap-2">
        <input
          type="checkbox"
          checked={showZones}
          onChange={(e) => onShowZones(e.currentTarget.checked)}
          data-testid="show-marshal-zones"
        />
        Show marshal zones
        <span className="text-ink-500">
          {doc.marshalPoints.length === 0
            ? "(drawn once the layout has a marshal point)"
            : "(hatched; hotspots as triangles)"}
        </span>
      </label>
      <button type="button" className={toolClass} onClick={onSuggest} disabled={marshal.busy}>
        {marshal.busy ? "Working out the points…" : "Suggest marshal points"}
      </button>
      {note ? <p className="text-ink-700">{note}</p> : null}
      {marshal.message ? <p className="text-danger-700">{marshal.message}</p> : null}
      {doc.marshalPoints.length === 0 ? (
        <p className="text-ink-500">No marshal points yet.</p>
      ) : !plan ? (
        <p className="text-ink-500">Checking the marshal points…</p>
      ) : warned.length === 0 ? (
        <p className="text-ink-700">
          Every marshal point is off the track, out of the zones and within reach
          {marshal.stale ? " (checking the latest change…)" : ""}.
        </p>
      ) : (
        <ul
          className={`space-y-2 ${marshal.stale ? "opacity-60" : ""}`}
          aria-label="Marshal point warnings"
          aria-busy={marshal.stale}
        >
          {marshal.stale ? <li className="text-ink-500">Checking the latest change…</li> : null}
          {warned.flatMap((p) =>
            p.warnings.map((w, k) => {
              const index = Number(p.id.slice(1)) - 1;
              return (
                <li
                  key={`${p.id}-${k}`}
                  className="rounded-md border border-danger-700/40 bg-danger-100/40 p-2"
                >
                  <p>
                    <strong>
                      {p.id} · {WARNING_KIND_WORDS[w.kind]}:
                    </strong>{" "}
                    {w.text} {w.action}
                  </p>
                  {w.moveTo && doc.marshalPoints[index] ? (
                    <button
                      type="button"
                      className={`${toolClass} mt-1`}
                      disabled={marshal.stale}
                      onClick={() =>
                        onChange(
                          moveMarshalPoint(doc, index, { x: w.moveTo![0], y: w.moveTo![1] }),
                          undefined,
                          { kind: "marshal", index },
                        )
                      }
                    >
                      Move {p.id} to the nearby safe spot
                    </button>
                  ) : null}
                </li>
              );
            }),
          )}
        </ul>
      )}
    </div>
  );
}
