/**
 * A club's track guidance for the rule checks: the chosen set ("club" or "national") and the
 * club's own values for some rules, stored in clubs.guidance_set and clubs.guidance_overrides;
 * and the club's own values for the set-up verdicts (smallest worthwhile gain and turn of the
 * nose), stored under "verdict" in the same JSON (no migration: decision 0110).
 */
import { eq } from "drizzle-orm";
import {
  GUIDANCE_SET_IDS,
  type GuidanceOverrides,
  type GuidanceSetId,
  type VerdictThresholds,
} from "~/analysis";
import { getDb } from "~/db/client.server";
import { clubs } from "~/db/schema";
import {
  storedOverridesSchema,
  storedVerdictSchema,
  type VerdictSettings,
} from "~/lib/schemas/club-settings";

export interface ClubGuidance {
  guidanceSet: GuidanceSetId;
  overrides: GuidanceOverrides;
  /** The club's verdict values, when it set any (s, deg). */
  verdict?: VerdictSettings;
}

/** The club's verdict values as the engine's thresholds (SI, radians); undefined for none. */
export function verdictThresholds(g: ClubGuidance): Partial<VerdictThresholds> | undefined {
  const v = g.verdict;
  if (!v) return undefined;
  return {
    ...(v.minGainPerPass === undefined ? {} : { minGainPerPass: v.minGainPerPass }),
    ...(v.minNoseTurnDeg === undefined ? {} : { minNoseTurn: (v.minNoseTurnDeg * Math.PI) / 180 }),
  };
}

/** Reads stored values defensively: an unknown set falls back to "club", bad overrides to none. */
export function readGuidance(row: { guidanceSet: string; guidanceOverrides: string }): ClubGuidance {
  const guidanceSet = (GUIDANCE_SET_IDS as readonly string[]).includes(row.guidanceSet)
    ? (row.guidanceSet as GuidanceSetId)
    : "club";
  let overrides: GuidanceOverrides = {};
  let verdict: VerdictSettings | undefined;
  try {
    const stored = JSON.parse(row.guidanceOverrides);
    const parsed = storedOverridesSchema.safeParse(stored);
    if (parsed.success) overrides = stripUndefined(parsed.data);
    const v = storedVerdictSchema.safeParse(stored?.verdict);
    if (v.success && Object.values(v.data).some((x) => x !== undefined)) verdict = stripUndefined(v.data);
  } catch {
    // Not JSON: treated as no overrides; the settings page shows the set's values and a save repairs it.
  }
  return verdict ? { guidanceSet, overrides, verdict } : { guidanceSet, overrides };
}

function stripUndefined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

/** The club's guidance (the defaults when the club does not exist). */
export async function loadClubGuidance(clubId: string): Promise<ClubGuidance> {
  const db = await getDb();
  const [row] = await db
    .select({ guidanceSet: clubs.guidanceSet, guidanceOverrides: clubs.guidanceOverrides })
    .from(clubs)
    .where(eq(clubs.id, clubId));
  return row ? readGuidance(row) : { guidanceSet: "club", overrides: {} };
}

/** Stores the club's guidance set and overrides (one statement: both change or neither). */
export async function saveClubGuidance(clubId: string, guidance: ClubGuidance): Promise<void> {
  const db = await getDb();
  await db
    .update(clubs)
    .set({
      guidanceSet: guidance.guidanceSet,
      guidanceOverrides: JSON.stringify({
        ...stripUndefined(guidance.overrides),
        ...(guidance.verdict ? { verdict: stripUndefined(guidance.verdict) } : {}),
      }),
    })
    .where(eq(clubs.id, clubId));
}
