/**
 * The set-up plan's steering timeline in plain words, one line a step, for a driver reading on a
 * phone: when to steer which way, for how long, and how early or late each switch may come. Pure.
 */
import type { JumpPlan } from "~/analysis";
import { percent } from "./format";

type Window = { earlyMs: number; lateMs: number } | undefined;

const within = (w: Window) =>
  w ? ` (may come ${Math.round(w.earlyMs)} ms early or ${Math.round(w.lateMs)} ms late)` : "";

/**
 * The steps of a plan as sentences in time order.
 * @param plan the jump's set-up plan (steering targets in degrees, positive left).
 * @param airtime time in the air, s (the last step holds until touchdown).
 */
export function steeringWords(plan: JumpPlan, airtime: number): string[] {
  const rows: { t: number; text: string }[] = [];
  plan.steering.forEach(([t, deg], i) => {
    const until = plan.steering[i + 1]?.[0] ?? airtime;
    const hold = Math.max(0, until - t);
    const window = plan.switches.find((s) => Math.abs(s.t - t) < 1e-6);
    const action =
      Math.abs(deg) < 0.5
        ? "straighten the wheels"
        : `steer ${deg > 0 ? "left" : "right"} ${Math.abs(deg).toFixed(0)}°`;
    const how =
      plan.steering[i + 1] === undefined
        ? ` and hold until touchdown at ${airtime.toFixed(2)} s`
        : ` for ${hold.toFixed(2)} s`;
    rows.push({ t, text: `At ${t.toFixed(2)} s after takeoff, ${action}${how}${within(window)}.` });
  });
  const p = plan.pitchPulse;
  if (p.kind !== "none" && p.duration > 0) {
    const word = p.kind === "brake" ? "brake" : "throttle";
    rows.push({
      t: p.start,
      text: `At ${p.start.toFixed(2)} s, press the ${word} (${percent(p.strength)}) for ${p.duration.toFixed(2)} s${within(plan.pulseSwitches[0])}.`,
    });
  }
  return rows.sort((a, b) => a.t - b.t).map((r) => r.text);
}
