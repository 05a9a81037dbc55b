/**
 * A club's track guidance for the rule checks: the chosen set ("club" or "national") and the
 * club's own values for some rules, stored in clubs.guidance_set and clubs.guidance_overrides.
 */
import { eq } from "drizzle-orm";
import { GUIDANCE_SET_IDS, type GuidanceOverrides, type GuidanceSetId } from "~/analysis";
import { getDb } from "~/db/client.server";
import { clubs } from "~/db/schema";
import { storedOverridesSchema } from "~/lib/schemas/club-settings";

export interface ClubGuidance {
  guidanceSet: GuidanceSetId;
  overrides: GuidanceOverrides;
}

/** Reads stored values defensively: an unknown set falls back to "club", bad overrides to none. */
export function readGuidance(row: { guidanceSet: string; guidanceOverrides: string }): ClubGuidance {
  const guidanceSet = (GUIDANCE_SET_IDS as readonly string[]).includes(row.guidanceSet)
    ? (row.guidanceSet as GuidanceSetId)
    : "club";
  let overrides: GuidanceOverrides = {};
  try {
    const parsed = storedOverridesSchema.safeParse(JSON.parse(row.guidanceOverrides));
    if (parsed.success) overrides = stripUndefined(parsed.data);
  } catch {
    // Not JSON: treated as no overrides; the settings page shows the set's values and a save repairs it.
  }
  return { guidanceSet, overrides };
}

function stripUndefined(o: GuidanceOverrides): GuidanceOverrides {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as GuidanceOverrides;
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
      guidanceOverrides: JSON.stringify(stripUndefined(guidance.overrides)),
    })
    .where(eq(clubs.id, clubId));
}
