import type { JumpPlan } from "~/analysis";

/**
 * The brake or throttle pulse in plain words: the car leaves the lip pitched up at the face angle
 * and should touch down pitched like the landing; the pulse on the driven wheels supplies the
 * difference (brake drops the nose, throttle raises it). The pulse's start, strength and length
 * are planned with the steering, so a late or light pulse may leave the wheels spinning for the
 * turn.
 */
export function pitchAdvice(
  plan: Pick<JumpPlan, "pitchPulse" | "pitchChangeDeg" | "pitchAimDeg" | "pitchDeg">,
): string {
  const p = plan.pitchPulse;
  const change = `The landing needs the nose ${plan.pitchChangeDeg < 0 ? "down" : "up"} by ${Math.abs(plan.pitchChangeDeg).toFixed(0)}\u00b0 compared with the lip.`;
  if (p.kind === "none" || p.duration <= 0)
    return `${change} No pulse is needed: hold the throttle steady in the air.`;
  const share = Math.round(p.strength * 100);
  const how =
    p.kind === "brake"
      ? share >= 95
        ? "Full brake"
        : `Brake lightly (about ${share}% of full brake)`
      : share >= 95
        ? "Full throttle"
        : `Blip the throttle (about ${share}% of full)`;
  const why = p.kind === "brake" ? "drops the nose" : "raises the nose";
  const until = p.stopsWheels ? " (until the wheels stop)" : "";
  const limited = p.limited
    ? ` The car cannot give all of it (wheels stop or the motor tops out): it lands about ${Math.abs(plan.pitchChangeDeg - plan.pitchAimDeg).toFixed(0)}\u00b0 nose-${plan.pitchChangeDeg < plan.pitchAimDeg ? "high" : "low"} of the landing.`
    : "";
  return `${change} ${how} from ${p.start.toFixed(2)} s to ${(p.start + p.duration).toFixed(2)} s after takeoff${until}: it ${why}.${limited}`;
}
