import { PLAN } from "~/components/editor/colours";
import type { JumpPlan } from "~/analysis";
import { ticks } from "./elevation-path";

export type SteeringSeries = {
  /** Airtime, s. */
  airtime: number;
  /** Steering lock, deg. */
  lockDeg: number;
  /** The wheels' angle as the servo follows the targets: [t s, deg] corners of a polyline. */
  wheels: [number, number][];
};

/** Drawing widths: a wide screen and paper, and a phone (about its width in px, so text stays 11 px+). */
const WIDE = 960;
const PHONE = 340;
const H = 300;
const M = { left: 56, right: 24, top: 24, bottom: 78 };

/**
 * The set-up plan's steering timeline: the targets the driver gives (dashed steps), the angle the
 * wheels follow at the servo's speed (solid), the timing window of each switch (shaded, with its
 * milliseconds written), and the brake or throttle pulse on a lane below. Left is up.
 */
export function SteeringChart({ plan, series }: { plan: JumpPlan; series: SteeringSeries }) {
  return (
    <figure className="max-w-4xl">
      <ChartSvg plan={plan} series={series} W={WIDE} className="hidden sm:block print:block" />
      <ChartSvg plan={plan} series={series} W={PHONE} className="sm:hidden print:hidden" />
      <figcaption className="mt-2 text-xs text-ink-500">
        Up is wheels to the left. Dashed: what to command on the transmitter; solid: where the wheels are as
        the servo follows; shaded: how early or late each switch may come and still land within{" "}
        {plan.rollToleranceDeg.toFixed(0)}° of level.
      </figcaption>
    </figure>
  );
}

function ChartSvg({
  plan,
  series,
  W,
  className,
}: {
  plan: JumpPlan;
  series: SteeringSeries;
  W: number;
  className: string;
}) {
  const T = series.airtime;
  const lock = Math.max(5, series.lockDeg);
  const X = (t: number) => M.left + (t / T) * (W - M.left - M.right);
  const plotBottom = H - M.bottom;
  const Y = (deg: number) => M.top + ((lock - deg) / (2 * lock)) * (plotBottom - M.top);
  const steps: string[] = [`${X(0)},${Y(0)}`];
  let last = 0;
  for (const [t, deg] of plan.steering) {
    steps.push(`${X(t)},${Y(last)}`, `${X(t)},${Y(deg)}`);
    last = deg;
  }
  steps.push(`${X(T)},${Y(last)}`);
  const wheels = [...series.wheels.filter(([t]) => t < T), [T, at(series.wheels, T)] as [number, number]];
  const pulse = plan.pitchPulse;
  const laneY = plotBottom + 36;
  // A window's label only where it does not run into the previous one (the steps list says all).
  const labelled = plan.switches.reduce<(number | null)[]>((out, s) => {
    const x = Math.min(W - M.right - 40, Math.max(M.left + 40, X(s.t)));
    const last = out.reduce<number>((m, v) => (v === null ? m : v), -Infinity);
    return [...out, x - last < 84 ? null : x];
  }, []);
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className={`h-auto w-full rounded-lg border border-sand-200 bg-white ${className}`}
      role="img"
      aria-label="Steering timeline of the set-up plan; the same steps are listed in the table below"
      fontFamily="Inter, sans-serif"
    >
      {plan.switches.map((s, i) => (
        <g key={i}>
          <rect
            x={X(Math.max(0, s.t - s.earlyMs / 1000))}
            y={M.top}
            width={Math.max(
              1,
              X(Math.min(T, s.t + s.lateMs / 1000)) - X(Math.max(0, s.t - s.earlyMs / 1000)),
            )}
            height={plotBottom - M.top}
            fill={PLAN.handleStroke}
            fillOpacity={0.12}
          />
          {labelled[i] !== null ? (
            <text x={labelled[i]} y={M.top - 8} fontSize={11} textAnchor="middle" fill={PLAN.text}>
              −{Math.round(s.earlyMs)}/+{Math.round(s.lateMs)} ms
            </text>
          ) : null}
        </g>
      ))}
      {ticks(-lock, lock, 4).map((d) => (
        <g key={`y${d}`}>
          <line
            x1={M.left}
            x2={W - M.right}
            y1={Y(d)}
            y2={Y(d)}
            stroke={d === 0 ? PLAN.gridMajor : PLAN.gridMinor}
          />
          <text x={M.left - 6} y={Y(d) + 4} fontSize={11} textAnchor="end" fill={PLAN.centre}>
            {d > 0 ? `${d}° L` : d < 0 ? `${-d}° R` : "0°"}
          </text>
        </g>
      ))}
      {ticks(0, T, 6).map((t) => (
        <text key={`x${t}`} x={X(t)} y={plotBottom + 14} fontSize={11} textAnchor="middle" fill={PLAN.centre}>
          {t}
        </text>
      ))}
      <text x={(M.left + W) / 2} y={H - 4} fontSize={12} textAnchor="middle" fill={PLAN.text}>
        Time after takeoff (s); touchdown at {T.toFixed(2)} s
      </text>
      <polyline
        points={steps.join(" ")}
        fill="none"
        stroke={PLAN.centre}
        strokeWidth={1.5}
        strokeDasharray="5 4"
      />
      <polyline
        points={wheels.map(([t, d]) => `${X(t)},${Y(d)}`).join(" ")}
        fill="none"
        stroke={PLAN.handleStroke}
        strokeWidth={2.5}
      />
      <line x1={M.left} x2={W - M.right} y1={laneY} y2={laneY} stroke={PLAN.gridMinor} />
      <text x={M.left - 6} y={laneY + 4} fontSize={11} textAnchor="end" fill={PLAN.centre}>
        pulse
      </text>
      {pulse.kind !== "none" && pulse.duration > 0 ? (
        <g>
          <rect
            x={X(pulse.start)}
            y={laneY - 7}
            width={Math.max(2, X(pulse.start + pulse.duration) - X(pulse.start))}
            height={14}
            fill={pulse.kind === "brake" ? PLAN.conflict : PLAN.selected}
          />
          <text x={X(pulse.start + pulse.duration) + 6} y={laneY + 4} fontSize={11} fill={PLAN.text}>
            {pulse.kind}
          </text>
        </g>
      ) : null}
    </svg>
  );
}

function at(pts: [number, number][], t: number): number {
  let v = 0;
  for (let i = 0; i < pts.length; i++) {
    if (pts[i][0] > t) {
      const [t0, v0] = pts[i - 1] ?? [0, 0];
      const [t1, v1] = pts[i];
      return v0 + ((v1 - v0) * (t - t0)) / (t1 - t0 || 1);
    }
    v = pts[i][1];
  }
  return v;
}
