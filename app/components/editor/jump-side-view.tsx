import { useRef, useState } from "react";
import type { JumpSection } from "~/analysis";
import {
  addProfilePoint,
  dragProfileHandle,
  profileHandles,
  removeProfilePoint,
} from "~/lib/editor/profile-edit";
import type { SnapSettings } from "~/lib/editor/snap";
import { H, PAD, sideViewGeometry, W } from "./jump-side-geometry";

interface Props {
  section: JumpSection;
  snap: SnapSettings;
  /** Planned takeoff speed from the analysis, m/s, to draw the flight (optional). */
  takeoffSpeed?: number;
  onChange(section: JumpSection, gesture: string): void;
  onGestureEnd(): void;
}

type Handle = ReturnType<typeof profileHandles>[number];

/**
 * Dragging the side view's handles (one undo step per drag) and nudging a focused handle with the
 * arrow keys (0.1 m along, 0.05 m up); in a free profile, the point last touched is picked.
 */
function useProfileDrag({ section, snap, onChange, onGestureEnd }: Props, scale: { sx: number; sy: number }) {
  const svg = useRef<SVGSVGElement>(null);
  const [dragging, setDragging] = useState<string | null>(null);
  const [picked, setPicked] = useState<number | null>(null);
  const gesture = useRef("");
  const custom = section.preset === "custom";

  const toProfile = (e: React.PointerEvent) => {
    const rect = svg.current!.getBoundingClientRect();
    const x = ((e.clientX - rect.left) / rect.width) * W;
    const y = ((e.clientY - rect.top) / rect.height) * H;
    return { d: (x - PAD) / scale.sx, h: (H - PAD - y) / scale.sy };
  };
  const move = (id: string, d: number, h: number) => {
    const next = dragProfileHandle(section, id, d, h, snap);
    if (next !== section) onChange(next, gesture.current);
  };
  const grab = (e: React.PointerEvent<SVGCircleElement>, hd: Handle, k: number) => {
    e.currentTarget.ownerSVGElement?.setPointerCapture(e.pointerId);
    gesture.current = `profile-${section.id}-${hd.id}-${Date.now()}`;
    setDragging(hd.id);
    if (custom) setPicked(k);
  };
  const nudge = (e: React.KeyboardEvent, hd: Handle) => {
    const dd = e.key === "ArrowRight" ? 0.1 : e.key === "ArrowLeft" ? -0.1 : 0;
    const dh = e.key === "ArrowUp" ? 0.05 : e.key === "ArrowDown" ? -0.05 : 0;
    if (!dd && !dh) return;
    e.preventDefault();
    e.stopPropagation();
    gesture.current = `profile-key-${Date.now()}`;
    move(hd.id, hd.d + dd, hd.h + dh);
    onGestureEnd();
  };
  const onPointerMove = (e: React.PointerEvent) => {
    if (!dragging) return;
    const { d, h } = toProfile(e);
    move(dragging, d, h);
  };
  const onPointerUp = () => {
    if (dragging) onGestureEnd();
    setDragging(null);
  };
  const pick = (k: number) => custom && setPicked(k);
  return { svg, picked, grab, nudge, pick, onPointerMove, onPointerUp };
}

/**
 * The jump's side view, editable: drag a handle (or focus it and use the arrow keys) to reshape the
 * jump. Heights are drawn stretched (the factor is written) so a 0.5 m lip is visible on an 8 m jump.
 */
export function JumpSideView(props: Props) {
  const { section, takeoffSpeed, onChange } = props;
  const { p, flight, sx, sy, X, Y, ground, ramp } = sideViewGeometry(section, takeoffSpeed);
  const { svg, picked, grab, nudge, pick, onPointerMove, onPointerUp } = useProfileDrag(props, { sx, sy });
  const custom = section.preset === "custom";

  return (
    <figure className="space-y-1">
      <svg
        ref={svg}
        viewBox={`0 0 ${W} ${H}`}
        className="w-full touch-none rounded border border-ink-300 bg-white"
        role="group"
        aria-label="Side view of the jump"
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
      >
        <path d={ground} fill="#e7e0d2" stroke="#8c7b5b" strokeWidth="1.5" />
        {ramp ? <path d={ramp} fill="none" stroke="#9c4518" strokeWidth="3" /> : null}
        <line
          x1={X(p.sweetSpot)}
          x2={X(p.sweetSpot)}
          y1={Y(0) + 4}
          y2={PAD}
          stroke="#1f5c4c"
          strokeDasharray="2 3"
        />
        {flight ? (
          <polyline
            points={flight.map(([d, h]) => `${X(d)},${Y(h)}`).join(" ")}
            fill="none"
            stroke="#d2692f"
            strokeWidth="1.5"
            strokeDasharray="5 3"
          />
        ) : null}
        <text
          x={X(p.d[p.lipIndex])}
          y={Y(p.h[p.lipIndex]) - 8}
          fontSize="10"
          textAnchor="middle"
          fill="#9c4518"
        >
          lip
        </text>
        {profileHandles(section).map((hd) => {
          const k = Number(hd.id.slice(1));
          return (
            <circle
              key={hd.id}
              cx={X(hd.d)}
              cy={Y(hd.h)}
              r={6}
              tabIndex={0}
              role="slider"
              aria-label={hd.label}
              aria-valuetext={`${hd.d.toFixed(2)} m along, ${hd.h.toFixed(2)} m high`}
              className="cursor-grab fill-white stroke-pine-700 focus:stroke-clay-500"
              strokeWidth={custom && picked === k ? 3.5 : 2}
              onPointerDown={(e) => grab(e, hd, k)}
              onFocus={() => pick(k)}
              onKeyDown={(e) => nudge(e, hd)}
            >
              <title>{hd.label}</title>
            </circle>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap justify-between gap-2 text-xs text-ink-500">
        <span>
          Heights drawn ×{(sy / sx).toFixed(1)} · length {p.length.toFixed(2)} m
        </span>
        <span>
          <span className="text-clay-700">━</span> landing, ┆ planned touchdown
          {flight ? ", ╌ flight at the planned speed" : ""}
        </span>
      </figcaption>
      {section.preset === "custom" ? (
        <CustomPointButtons section={section} picked={picked} onChange={onChange} />
      ) : null}
    </figure>
  );
}

/** A free profile's points: add one after the picked point, or remove the picked point. */
function CustomPointButtons({
  section,
  picked,
  onChange,
}: {
  section: Extract<JumpSection, { preset: "custom" }>;
  picked: number | null;
  onChange(section: JumpSection, gesture: string): void;
}) {
  return (
    <div className="flex flex-wrap gap-2 text-xs">
      <button
        type="button"
        className="rounded border border-ink-300 px-2 py-1 hover:bg-sand-100"
        disabled={picked === null && section.profile.length < 2}
        onClick={() => onChange(addProfilePoint(section, picked ?? 0), `profile-add-${Date.now()}`)}
      >
        Add a point after {picked === null ? "the first point" : `point ${picked + 1}`}
      </button>
      <button
        type="button"
        className="rounded border border-ink-300 px-2 py-1 hover:bg-sand-100 disabled:opacity-50"
        disabled={picked === null}
        onClick={() =>
          picked !== null && onChange(removeProfilePoint(section, picked), `profile-remove-${Date.now()}`)
        }
      >
        Remove {picked === null ? "a point" : `point ${picked + 1}`}
      </button>
    </div>
  );
}
