/**
 * Calibrating the site photo's scale: two points clicked on the photo and the real distance
 * between them. The distance typed and the refusal stay while the panel is open (so leaving the
 * mode and coming back keeps them), hence they live in the panel through useCalibration.
 */
import { useState } from "react";
import { calibrate, type Background } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import type { CanvasMode } from "./canvas-types";
import { toolClass } from "./editor-toolbar";

interface Options {
  background: Background | undefined;
  calibrationPoints: Point[];
  onMode(mode: CanvasMode): void;
  onBackground(bg: Background | undefined, gesture?: string): void;
  onResetCalibration(): void;
}

export function useCalibration(p: Options) {
  const [distance, setDistance] = useState("");
  const [error, setError] = useState<string | null>(null);

  function apply(e: React.FormEvent) {
    e.preventDefault();
    if (!p.background) return;
    const [a, b] = p.calibrationPoints;
    const metres = Number(distance);
    if (distance.trim() === "" || !Number.isFinite(metres)) {
      setError("Distance must be a number in metres.");
      return;
    }
    const out = calibrate(p.background, a, b, metres);
    if (!out.ok) {
      setError(out.message);
      return;
    }
    setError(null);
    setDistance("");
    p.onBackground(out.background);
    p.onResetCalibration();
    p.onMode("select");
  }

  function cancel() {
    p.onResetCalibration();
    setError(null);
    p.onMode("select");
  }

  return { distance, setDistance, error, apply, cancel };
}

/** The calibration form: what to click next, then the distance and "Set the scale". */
export function CalibrationForm({
  points,
  calibration,
}: {
  points: number;
  calibration: ReturnType<typeof useCalibration>;
}) {
  const { distance, setDistance, error, apply, cancel } = calibration;
  return (
    <form
      className="space-y-2 rounded-md border border-clay-500 bg-clay-100/50 p-2"
      onSubmit={apply}
      aria-label="Calibrate the photo's scale"
    >
      <p className="text-xs font-medium" role="status">
        {points === 0
          ? "Click a first point on the photo whose distance to another you know (two fence posts, a building's corners)."
          : points === 1
            ? "Now click the second point."
            : "Type the real distance between the two points."}
      </p>
      {points === 2 ? (
        <div className="space-y-1">
          <label htmlFor="calibration-distance" className="block text-xs font-medium text-ink-700">
            Distance between the points (m)
          </label>
          <input
            id="calibration-distance"
            type="number"
            step="any"
            min="0"
            inputMode="decimal"
            autoFocus
            className="block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm"
            value={distance}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? "calibration-error" : undefined}
            onChange={(e) => setDistance(e.target.value)}
          />
          {error ? (
            <p id="calibration-error" role="alert" className="text-xs text-danger-700">
              {error}
            </p>
          ) : null}
        </div>
      ) : null}
      <div className="flex gap-1.5">
        {points === 2 ? (
          <button
            type="submit"
            className="rounded-md bg-pine-700 px-2.5 py-1.5 text-sm font-medium text-white hover:bg-pine-800"
          >
            Set the scale
          </button>
        ) : null}
        <button type="button" className={toolClass} onClick={cancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
