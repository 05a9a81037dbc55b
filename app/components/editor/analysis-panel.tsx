import {
  CAR_PRESETS,
  SKILL_LABELS,
  SKILL_LEVELS,
  VERDICT_WORDS,
  type AnalysisOverlay,
  type LayoutSection,
} from "~/analysis";
import { VerdictMark } from "~/components/analysis/verdict-mark";
import type { AnalysisStatus, Skill } from "./use-analysis";

interface Props {
  overlay: AnalysisOverlay | null;
  status: AnalysisStatus;
  stale: boolean;
  sections: LayoutSection[];
  classIds: string[];
  /** Cars to offer instead of `classIds` (the plan offers the reader's own car profiles too). */
  carOptions?: { value: string; label: string }[];
  classId: string | undefined;
  skill: Skill;
  selected: number | null;
  onClass(id: string): void;
  onSkill(skill: Skill): void;
  onSelect(index: number): void;
}

/** Live analysis: what is being worked out, the jumps with their verdicts (click selects), rule failures. */
export function AnalysisPanel(p: Props) {
  const index = new Map(p.sections.map((s, i) => [s.id, i] as const));
  const o = p.overlay;
  const cars = p.carOptions ?? p.classIds.map((c) => ({ value: c, label: CAR_PRESETS[c]?.label ?? c }));
  const carLabel = o ? (CAR_PRESETS[o.classId]?.label ?? cars.find((c) => c.value === p.classId)?.label) : "";
  return (
    <div className="space-y-3 text-sm">
      <div className="grid grid-cols-2 gap-2">
        <label className="space-y-1 text-xs font-medium text-ink-700">
          {p.carOptions ? "Car" : "Car class"}
          <select
            className="block w-full rounded-md border border-ink-300 bg-white px-1.5 py-1 text-sm"
            value={p.classId}
            onChange={(e) => p.onClass(e.target.value)}
          >
            {cars.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-xs font-medium text-ink-700">
          Driver skill
          <select
            className="block w-full rounded-md border border-ink-300 bg-white px-1.5 py-1 text-sm"
            value={p.skill}
            onChange={(e) => p.onSkill(e.target.value as Skill)}
          >
            {SKILL_LEVELS.map((s) => (
              <option key={s} value={s}>
                {SKILL_LABELS[s]}
              </option>
            ))}
          </select>
        </label>
      </div>
      <p
        className="flex items-center gap-2 text-xs"
        role="status"
        aria-live="polite"
        data-testid="analysis-status"
      >
        {p.status.state === "working" ? (
          <span className="inline-block h-2 w-2 animate-pulse rounded-full bg-pine-600" aria-hidden="true" />
        ) : null}
        <span className={p.status.state === "failed" ? "text-danger-700" : "text-ink-500"}>
          {p.status.state === "working"
            ? "Working out the analysis…"
            : p.status.state === "ready"
              ? "Analysis up to date."
              : p.status.state === "idle"
                ? "The analysis follows your changes."
                : p.status.message}
        </span>
      </p>
      {o ? (
        <div className={p.stale ? "opacity-70" : ""}>
          <p className="tabular-nums">
            Lap {o.lapLength.toFixed(1)} m · about {o.lapTime.toFixed(1)} s for the {carLabel ?? o.classId}
          </p>
          <h3 className="mt-2 font-semibold">Jumps ({o.jumps.length})</h3>
          {o.jumps.length ? (
            <ul className="mt-1 space-y-1" aria-label="Jumps and their verdicts">
              {o.jumps.map((j, k) => {
                const i = index.get(j.sectionId);
                const name = i !== undefined ? p.sections[i].name : undefined;
                return (
                  <li key={j.sectionId}>
                    <button
                      type="button"
                      disabled={i === undefined}
                      aria-current={i === p.selected ? "true" : undefined}
                      className="flex w-full gap-2 rounded px-1.5 py-1 text-left hover:bg-sand-100 aria-[current=true]:bg-clay-100"
                      onClick={() => i !== undefined && p.onSelect(i)}
                    >
                      <VerdictMark kind={j.verdict} size={16} showWord={false} className="mt-0.5" />
                      <span>
                        <span className="font-medium">
                          J{k + 1} {VERDICT_WORDS[j.verdict]}
                        </span>
                        <span className="block text-xs text-ink-700">
                          {name ?? "Jump"}
                          {i !== undefined ? ` · section ${i + 1}` : ""}
                        </span>
                        <span className="block text-xs text-ink-700">{j.label}</span>
                        <span className="block text-xs tabular-nums text-ink-500">
                          takeoff {j.takeoffSpeed.toFixed(1)} m/s · {j.airtime.toFixed(2)} s in the air
                        </span>
                      </span>
                    </button>
                  </li>
                );
              })}
            </ul>
          ) : (
            <p className="text-xs text-ink-500">No jumps on this layout.</p>
          )}
          {o.ruleFailures.length ? (
            <>
              <h3 className="mt-3 font-semibold">Track guidance not met ({o.ruleFailures.length})</h3>
              <ul className="mt-1 list-disc space-y-1 pl-5 text-xs">
                {o.ruleFailures.map((r) => (
                  <li key={r.id}>
                    {r.label}: {r.measured} (asks {r.required})
                  </li>
                ))}
              </ul>
            </>
          ) : null}
          {o.hidden.length || o.laneConflicts.length ? (
            <p className="mt-2 text-xs text-ink-700">
              {o.hidden.length
                ? `${o.hidden.length} stretch${o.hidden.length > 1 ? "es" : ""} hidden from the driver stand (dashed on the plan). `
                : ""}
              {o.laneConflicts.length
                ? `${o.laneConflicts.length} place${o.laneConflicts.length > 1 ? "s" : ""} where lanes come too close (dotted).`
                : ""}
            </p>
          ) : null}
          <p className="mt-3 text-xs text-ink-500">
            These are estimates from a model, not a safety certification. Follow your sanctioning body's
            current rulebook and your site's own risk assessment.
          </p>
        </div>
      ) : null}
    </div>
  );
}
