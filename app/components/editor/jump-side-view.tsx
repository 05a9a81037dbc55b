import { useRef, useState } from "react";
import { flyJump } from "~/analysis";
import { jumpProfile } from "~/analysis";
import {
  addProfilePoint,
  dragProfileHandle,
  profileHandles,
  removeProfilePoint,
} from "~/lib/editor/profile-edit";
import type { SnapSettings } from "~/lib/editor/snap";
import type { JumpSection } from "~/analysis";

const W = 320;
const H = 130;
const PAD = 14;

interface Props {
  section: JumpSection;
  snap: SnapSettings;
  /** Planned takeoff speed from the analysis, m/s, to draw the flight (optional). */
  takeoffSpeed?: number;
  onChange(section: JumpSection, gesture: string): void;
  onGestureEnd(): void;
}

/**
 * The jump's side view, editable: drag a handle (or focus it and use the arrow keys) to reshape the
 * jump. Heights are drawn stretched (the factor is written) so a 0.5 m lip is visible on an 8 m jump.
 */
export function JumpSideView({ section, snap, takeoffSpeed, onChange, onGestureEnd }: Props) {
  const svg = useRef<SVGSVGElement>(null);
  const [dragging, setDragging] = useState<string | null>(null);
  const [picked, setPicked] = useState<number | null>(null);
  const gesture = useRef("");
  const p = jumpProfile(section);
  const flight = takeoffSpeed ? flightPath(p, takeoffSpeed) : null;
  const maxH = Math.max(0.3, ...p.h, ...(flight ?? []).map(([, h]) => h));
  const length = Math.max(p.length * 1.15 + 0.5, ...(flight ?? []).map(([d]) => d + 0.3));
  const sx = (W - 2 * PAD) / length;
  const sy = Math.min(sx * 4, (H - 2 * PAD - 10) / maxH);
  const X = (d: number) => PAD + d * sx;
  const Y = (h: number) => H - PAD - h * sy;
  const ground =
    `M ${X(-0.2)} ${Y(0)} ` +
    p.d.map((d, k) => `L ${X(d)} ${Y(p.h[k])}`).join(" ") +
    ` L ${X(length)} ${Y(0)} L ${X(length)} ${H} L ${X(-0.2)} ${H} Z`;
  const ramp = p.d
    .slice(p.landingStartIndex, p.landingEndIndex + 1)
    .map((d, k) => `${k ? "L" : "M"} ${X(d)} ${Y(p.h[p.landingStartIndex + k])}`)
    .join(" ");
  const handles = profileHandles(section);

  const toProfile = (e: React.PointerEvent) => {
    const rect = svg.current!.getBoundingClientRect();
    const x = ((e.clientX - rect.left) / rect.width) * W;
    const y = ((e.clientY - rect.top) / rect.height) * H;
    return { d: (x - PAD) / sx, h: (H - PAD - y) / sy };
  };
  const move = (id: string, d: number, h: number) => {
    const next = dragProfileHandle(section, id, d, h, snap);
    if (next !== section) onChange(next, gesture.current);
  };

  return (
    <figure className="space-y-1">
      <svg
        ref={svg}
        viewBox={`0 0 ${W} ${H}`}
        className="w-full touch-none rounded border border-ink-300 bg-white"
        role="group"
        aria-label="Side view of the jump"
        onPointerMove={(e) => {
          if (!dragging) return;
          const { d, h } = toProfile(e);
          move(dragging, d, h);
        }}
        onPointerUp={() => {
          if (dragging) onGestureEnd();
          setDragging(null);
        }}
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
        {handles.map((hd) => {
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
              strokeWidth={section.preset === "custom" && picked === k ? 3.5 : 2}
              onPointerDown={(e) => {
                e.currentTarget.ownerSVGElement?.setPointerCapture(e.pointerId);
                gesture.current = `profile-${section.id}-${hd.id}-${Date.now()}`;
                setDragging(hd.id);
                if (section.preset === "custom") setPicked(k);
              }}
              onFocus={() => section.preset === "custom" && setPicked(k)}
              onKeyDown={(e) => {
                const dd = e.key === "ArrowRight" ? 0.1 : e.key === "ArrowLeft" ? -0.1 : 0;
                const dh = e.key === "ArrowUp" ? 0.05 : e.key === "ArrowDown" ? -0.05 : 0;
                if (!dd && !dh) return;
                e.preventDefault();
                e.stopPropagation();
                gesture.current = `profile-key-${Date.now()}`;
                move(hd.id, hd.d + dd, hd.h + dh);
                onGestureEnd();
              }}
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
      ) : null}
    </figure>
  );
}

/** The flight from the lip at the planned speed along the face (no drag), as [d, h] points. */
function flightPath(p: ReturnType<typeof jumpProfile>, speed: number): [number, number][] | null {
  const surface = p.d.slice(p.lipIndex).map((d, k) => ({ x: d, z: p.h[p.lipIndex + k] }));
  const lip = { x: p.d[p.lipIndex], z: p.h[p.lipIndex] };
  try {
    const f = flyJump({ speed, faceAngleRad: p.faceAngle, lip, surface });
    const pts: [number, number][] = [];
    for (let k = 0; k <= 24; k++) {
      const t = (f.airtime * k) / 24;
      pts.push([
        lip.x + speed * Math.cos(p.faceAngle) * t,
        lip.z + speed * Math.sin(p.faceAngle) * t - (9.81 * t * t) / 2,
      ]);
    }
    return pts;
  } catch {
    return null;
  }
}
