/**
 * The steering timeline in plain words, from a real set-up plan of the demo summer layout: one
 * line per step in time order, each steering step held until the next, the last until touchdown,
 * with the timing window of each switch.
 */
import { describe, expect, it } from "vitest";
import { analyseLayout } from "~/analysis";
import { steeringWords } from "~/components/analysis/steering-words";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

describe("steering in plain words", () => {
  it("says when to steer which way, for how long and how early or late, until touchdown", () => {
    const analysis = analyseLayout(SUMMER_LAYOUT, { classIds: [SUMMER_LAYOUT.carClasses[0]] });
    const jump = analysis.classes[0].jumps.find((j) => j.plan?.feasible)!;
    const plan = jump.plan!;
    const lines = steeringWords(plan, jump.airtime);
    const pulse = plan.pitchPulse.kind !== "none" && plan.pitchPulse.duration > 0 ? 1 : 0;
    expect(lines).toHaveLength(plan.steering.length + pulse);
    const times = lines.map((l) => Number(/^At (\d+\.\d+) s/.exec(l)![1]));
    expect(times).toEqual([...times].sort((a, b) => a - b));
    const steering = lines.filter((l) => /steer|straighten/.test(l));
    expect(steering.at(-1)).toContain(`hold until touchdown at ${jump.airtime.toFixed(2)} s`);
    // Each step is held until the next one starts.
    plan.steering.slice(0, -1).forEach(([t], i) => {
      const hold = plan.steering[i + 1][0] - t;
      expect(steering[i]).toContain(`for ${hold.toFixed(2)} s`);
    });
    for (const s of plan.switches)
      expect(lines.join(" ")).toContain(
        `may come ${Math.round(s.earlyMs)} ms early or ${Math.round(s.lateMs)} ms late`,
      );
  });
});
