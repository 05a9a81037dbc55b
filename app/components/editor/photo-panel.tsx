import type { Background } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import type { CanvasMode } from "./canvas-types";
import { toolClass } from "./editor-toolbar";
import { NumberField } from "./number-field";
import { CalibrationForm, useCalibration } from "./photo-calibration";
import { usePhotoUpload } from "./use-photo-upload";

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
  const uploader = usePhotoUpload(p.layoutId, p.onUploaded);
  const calibration = useCalibration(p);
  const bg = p.background;
  return (
    <div className="space-y-3 text-sm">
      <PhotoUpload replace={!!bg} uploader={uploader} />
      {bg ? (
        <>
          <p className="text-xs text-ink-500 tabular-nums" data-testid="photo-scale">
            Scale: 1 pixel = {bg.metresPerPixel.toPrecision(3)} m ({(1 / bg.metresPerPixel).toFixed(1)} pixels
            per metre)
          </p>
          {p.mode === "calibrate" ? (
            <CalibrationForm points={p.calibrationPoints.length} calibration={calibration} />
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
          <PhotoAdjustments bg={bg} onBackground={p.onBackground} onGestureEnd={p.onGestureEnd} />
        </>
      ) : null}
    </div>
  );
}

/** The file field (PNG or JPEG, at most 10 MB), the upload in progress and why it failed. */
function PhotoUpload({
  replace,
  uploader,
}: {
  replace: boolean;
  uploader: ReturnType<typeof usePhotoUpload>;
}) {
  const { busy, error, upload } = uploader;
  return (
    <div className="space-y-1">
      <label htmlFor="photo-file" className="block text-xs font-medium text-ink-700">
        {replace ? "Replace the site photo" : "Site photo"} (PNG or JPEG, at most 10 MB)
      </label>
      <input
        id="photo-file"
        type="file"
        accept="image/png,image/jpeg"
        disabled={busy}
        aria-describedby={error ? "photo-error" : undefined}
        className="block w-full text-sm file:mr-2 file:rounded-md file:border file:border-ink-300 file:bg-white file:px-2 file:py-1"
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = "";
          if (file) void upload(file);
        }}
      />
      {busy ? <p className="text-xs text-ink-500">Uploading…</p> : null}
      {error ? (
        <p id="photo-error" role="alert" className="text-xs text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** Opacity, rotation, hiding and removing the photo. */
function PhotoAdjustments({
  bg,
  onBackground,
  onGestureEnd,
}: {
  bg: Background;
  onBackground(bg: Background | undefined, gesture?: string): void;
  onGestureEnd(): void;
}) {
  return (
    <>
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
          onChange={(e) => onBackground({ ...bg, opacity: Number(e.target.value) / 100 }, "photo-opacity")}
          onPointerUp={onGestureEnd}
          onKeyUp={onGestureEnd}
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
            : (onBackground({ ...bg, rotationDeg: v }, "photo-rotation"), null)
        }
        onDone={onGestureEnd}
      />
      <div className="flex flex-wrap items-center gap-3">
        <label className="inline-flex items-center gap-1.5">
          <input
            type="checkbox"
            checked={bg.hidden}
            onChange={(e) => onBackground({ ...bg, hidden: e.target.checked })}
          />
          Hide the photo
        </label>
        <button type="button" className={toolClass} onClick={() => onBackground(undefined)}>
          Remove the photo
        </button>
      </div>
    </>
  );
}
