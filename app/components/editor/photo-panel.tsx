import { useState } from "react";
import { calibrate, type Background } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import type { CanvasMode } from "./canvas-types";
import { toolClass } from "./editor-toolbar";
import { NumberField } from "./number-field";

/** Same limit as the server's (app/storage/uploads.server.ts), checked here to spare a long upload. */
const PHOTO_MAX_BYTES = 10 * 1024 * 1024;

interface Props {
  layoutId: string;
  background: Background | undefined;
  mode: CanvasMode;
  calibrationPoints: Point[];
  onMode(mode: CanvasMode): void;
  /** A new photo was uploaded: its id, address and size in pixels. */
  onUploaded(fileId: string, width: number, height: number): void;
  onBackground(bg: Background | undefined, gesture?: string): void;
  onGestureEnd(): void;
  onResetCalibration(): void;
}

/** The site photo: upload, calibrate the scale with two points and a distance, opacity, hide. */
export function PhotoPanel(p: Props) {
  const [busy, setBusy] = useState(false);
  const [uploadError, setUploadError] = useState<string | null>(null);
  const [distance, setDistance] = useState("");
  const [calError, setCalError] = useState<string | null>(null);
  const bg = p.background;

  async function upload(file: File) {
    setUploadError(null);
    if (file.size > PHOTO_MAX_BYTES) {
      setUploadError("The file is too large: at most 10 MB.");
      return;
    }
    setBusy(true);
    try {
      const form = new FormData();
      form.append("photo", file);
      const response = await fetch(`/layouts/${p.layoutId}/photo`, {
        method: "POST",
        body: form,
        credentials: "same-origin",
      });
      const body = (await response.json().catch(() => null)) as {
        fileId?: string;
        url?: string;
        error?: string;
      } | null;
      if (!response.ok || !body?.fileId || !body.url) {
        setUploadError(body?.error ?? `The upload failed (error ${response.status}).`);
        return;
      }
      const img = new window.Image();
      await new Promise<void>((resolve, reject) => {
        img.onload = () => resolve();
        img.onerror = () => reject(new Error("The photo was stored but could not be shown."));
        img.src = body.url!;
      });
      p.onUploaded(body.fileId, img.naturalWidth, img.naturalHeight);
    } catch (error) {
      setUploadError((error as Error).message);
    } finally {
      setBusy(false);
    }
  }

  function applyCalibration(e: React.FormEvent) {
    e.preventDefault();
    if (!bg) return;
    const [a, b] = p.calibrationPoints;
    const metres = Number(distance);
    if (distance.trim() === "" || !Number.isFinite(metres)) {
      setCalError("Distance must be a number in metres.");
      return;
    }
    const out = calibrate(bg, a, b, metres);
    if (!out.ok) {
      setCalError(out.message);
      return;
    }
    setCalError(null);
    setDistance("");
    p.onBackground(out.background);
    p.onResetCalibration();
    p.onMode("select");
  }

  const calibrating = p.mode === "calibrate";
  return (
    <div className="space-y-3 text-sm">
      <div className="space-y-1">
        <label htmlFor="photo-file" className="block text-xs font-medium text-ink-700">
          {bg ? "Replace the site photo" : "Site photo"} (PNG or JPEG, at most 10 MB)
        </label>
        <input
          id="photo-file"
          type="file"
          accept="image/png,image/jpeg"
          disabled={busy}
          aria-describedby={uploadError ? "photo-error" : undefined}
          className="block w-full text-sm file:mr-2 file:rounded-md file:border file:border-ink-300 file:bg-white file:px-2 file:py-1"
          onChange={(e) => {
            const file = e.target.files?.[0];
            e.target.value = "";
            if (file) void upload(file);
          }}
        />
        {busy ? <p className="text-xs text-ink-500">Uploading…</p> : null}
        {uploadError ? (
          <p id="photo-error" role="alert" className="text-xs text-danger-700">
            {uploadError}
          </p>
        ) : null}
      </div>
      {bg ? (
        <>
          <p className="text-xs text-ink-500 tabular-nums" data-testid="photo-scale">
            Scale: 1 pixel = {bg.metresPerPixel.toPrecision(3)} m ({(1 / bg.metresPerPixel).toFixed(1)} pixels
            per metre)
          </p>
          {calibrating ? (
            <form
              className="space-y-2 rounded-md border border-clay-500 bg-clay-100/50 p-2"
              onSubmit={applyCalibration}
              aria-label="Calibrate the photo's scale"
            >
              <p className="text-xs font-medium" role="status">
                {p.calibrationPoints.length === 0
                  ? "Click a first point on the photo whose distance to another you know (two fence posts, a building's corners)."
                  : p.calibrationPoints.length === 1
                    ? "Now click the second point."
                    : "Type the real distance between the two points."}
              </p>
              {p.calibrationPoints.length === 2 ? (
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
                    aria-invalid={calError ? true : undefined}
                    aria-describedby={calError ? "calibration-error" : undefined}
                    onChange={(e) => setDistance(e.target.value)}
                  />
                  {calError ? (
                    <p id="calibration-error" role="alert" className="text-xs text-danger-700">
                      {calError}
                    </p>
                  ) : null}
                </div>
              ) : null}
              <div className="flex gap-1.5">
                {p.calibrationPoints.length === 2 ? (
                  <button
                    type="submit"
                    className="rounded-md bg-pine-700 px-2.5 py-1.5 text-sm font-medium text-white hover:bg-pine-800"
                  >
                    Set the scale
                  </button>
                ) : null}
                <button
                  type="button"
                  className={toolClass}
                  onClick={() => (p.onResetCalibration(), setCalError(null), p.onMode("select"))}
                >
                  Cancel
                </button>
              </div>
            </form>
          ) : (
            <div className="flex flex-wrap gap-1.5">
              <button
                type="button"
                className={toolClass}
                onClick={() => (p.onResetCalibration(), p.onMode("calibrate"))}
              >
                Calibrate the scale
              </button>
              <button
                type="button"
                className={toolClass + (p.mode === "move-photo" ? " border-clay-500 bg-clay-100" : "")}
                aria-pressed={p.mode === "move-photo"}
                onClick={() => p.onMode(p.mode === "move-photo" ? "select" : "move-photo")}
              >
                {p.mode === "move-photo" ? "Done moving" : "Move the photo"}
              </button>
            </div>
          )}
          <div className="space-y-1">
            <label htmlFor="photo-opacity" className="block text-xs font-medium text-ink-700">
              Opacity ({Math.round(bg.opacity * 100)} %)
            </label>
            <input
              id="photo-opacity"
              type="range"
              min={0}
              max={100}
              step={5}
              className="w-full"
              value={Math.round(bg.opacity * 100)}
              onChange={(e) =>
                p.onBackground({ ...bg, opacity: Number(e.target.value) / 100 }, "photo-opacity")
              }
              onPointerUp={p.onGestureEnd}
              onKeyUp={p.onGestureEnd}
            />
          </div>
          <NumberField
            label="Rotation"
            unit="deg"
            value={bg.rotationDeg}
            decimals={1}
            onValue={(v) =>
              Math.abs(v) > 360
                ? "must be between -360 and 360 deg"
                : (p.onBackground({ ...bg, rotationDeg: v }, "photo-rotation"), null)
            }
            onDone={p.onGestureEnd}
          />
          <div className="flex flex-wrap items-center gap-3">
            <label className="inline-flex items-center gap-1.5">
              <input
                type="checkbox"
                checked={bg.hidden}
                onChange={(e) => p.onBackground({ ...bg, hidden: e.target.checked })}
              />
              Hide the photo
            </label>
            <button type="button" className={toolClass} onClick={() => p.onBackground(undefined)}>
              Remove the photo
            </button>
          </div>
        </>
      ) : null}
    </div>
  );
}
