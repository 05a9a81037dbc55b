import type { JumpPlan } from "~/analysis";

/**
 * The brake or throttle pulse in plain words: the car leaves the lip pitched up at the face angle
 * and should touch down pitched like the landing; the pulse on the driven wheels supplies the
 * difference (brake drops the nose, throttle raises it).
 */
export function pitchAdvice(plan: Pick<JumpPlan, "pitchPulse" | "pitchChangeDeg" | "pitchDeg">): string {
  const p = plan.pitchPulse;
  const change = `The landing needs the nose ${plan.pitchChangeDeg < 0 ? "down" : "up"} by ${Math.abs(plan.pitchChangeDeg).toFixed(0)}\u00b0 compared with the lip.`;
  if (p.kind === "none" || p.duration <= 0)
    return `${change} No pulse is needed: hold the throttle steady in the air.`;
  const what = p.kind === "brake" ? "Tap the brake" : "Blip the throttle";
  const why = p.kind === "brake" ? "drops the nose" : "raises the nose";
  const limited = p.limited
    ? " The car cannot give all of it (wheels stop or the motor tops out), so expect to land a little off."
    : "";
  return `${change} ${what} from ${p.start.toFixed(2)} s to ${(p.start + p.duration).toFixed(2)} s after takeoff: it ${why}.${limited}`;
}
