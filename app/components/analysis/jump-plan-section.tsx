import type { JumpAnalysis } from "~/analysis";
import { pitchAdvice } from "./pitch-advice";
import { SteeringChart, type SteeringSeries } from "./steering-chart";

const INFEASIBLE: Record<string, string> = {
  "no-wheel-spin": "the wheels are not spinning, so steering cannot turn the car",
  "not-enough-airtime": "the car is not in the air long enough to turn it and land flat",
  "no-useful-yaw": "no steering turns the nose far enough to help",
  "cannot-land-flat": "no steering turns it and still lands it flat",
};

const side = (deg: number) =>
  Math.abs(deg) < 0.5 ? "straight" : `${Math.abs(deg).toFixed(0)}° ${deg > 0 ? "left" : "right"}`;

/** The mid-air set-up plan: steering timeline chart, the same steps as a table, the pitch advice. */
export function JumpPlanSection({
  jump: j,
  steering,
}: {
  jump: JumpAnalysis;
  steering: SteeringSeries | null;
}) {
  const plan = j.plan;
  return (
    <section aria-labelledby="plan-heading" className="space-y-3">
      <h2 id="plan-heading" className="text-lg font-semibold">
        Mid-air set-up plan
      </h2>
      {!plan ? (
        <p className="text-sm text-ink-700">
          {j.turn
            ? "No plan: the turn after this landing is too gentle or the flight too short to need one."
            : "No plan: this jump does not land into a turn, so the car should land straight."}
        </p>
      ) : !plan.feasible ? (
        <p className="text-sm text-ink-700">
          No workable plan: {INFEASIBLE[plan.reason ?? ""] ?? plan.reason}.
        </p>
      ) : (
        <>
          <p className="text-sm text-ink-700">
            Lands with the nose turned {Math.abs(plan.yawDeg).toFixed(0)}° {j.turn?.side ?? ""} (aiming for{" "}
            {Math.abs(plan.targetYawDeg).toFixed(0)}°), rolled {Math.abs(plan.rollDeg).toFixed(1)}° (within{" "}
            {plan.rollToleranceDeg.toFixed(0)}°). Tightest timing window: {Math.round(plan.timingWindowMs)}{" "}
            ms.
          </p>
          {steering ? <SteeringChart plan={plan} series={steering} /> : null}
          <div className="overflow-x-auto">
            <table className="min-w-[24rem] text-sm">
              <caption className="text-left text-sm font-medium text-ink-700">
                Steering steps (what to command)
              </caption>
              <thead className="text-left text-ink-500">
                <tr>
                  <th scope="col" className="py-1 pr-6 font-medium">
                    From (s after takeoff)
                  </th>
                  <th scope="col" className="py-1 pr-6 font-medium">
                    Steer
                  </th>
                  <th scope="col" className="py-1 font-medium">
                    Timing window
                  </th>
                </tr>
              </thead>
              <tbody>
                {plan.steering.map(([t, deg], i) => {
                  const w = plan.switches.find((s) => Math.abs(s.t - t) < 1e-6);
                  return (
                    <tr key={i} className="border-t border-sand-200">
                      <td className="py-1 pr-6 tabular-nums">{t.toFixed(2)}</td>
                      <td className="py-1 pr-6">{side(deg)}</td>
                      <td className="py-1 tabular-nums">
                        {w
                          ? `${Math.round(w.earlyMs)} ms early to ${Math.round(w.lateMs)} ms late`
                          : "\u2013"}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          <p className="rounded-md bg-sand-100 px-3 py-2 text-sm">
            <span className="font-medium">Pitch: </span>
            {pitchAdvice(plan)}
          </p>
        </>
      )}
    </section>
  );
}
