/**
 * What the calibration form offers: the layout's published versions (withdrawn ones left out), the
 * club's other layouts' published versions for a second file, and the cars: every class and the
 * member's own profiles.
 */
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { CAR_PRESET_IDS, carPreset } from "~/analysis";
import { listProfiles } from "~/cars/profiles.server";
import { PROFILE_PREFIX } from "~/cars/reader-choice.server";
import { getDb } from "~/db/client.server";
import { layouts, publishedVersions } from "~/db/schema";

export type Choice = { value: string; label: string };

export type LivePublication = {
  layoutId: string;
  name: string;
  versionNumber: number;
  raceDate: string | null;
};

export type CalibrationOptions = { versions: Choice[]; others: Choice[]; cars: Choice[]; ownCars: Choice[] };

/** Published versions not withdrawn of the club's layouts, by layout name, newest first. */
export async function livePublications(clubId: string): Promise<LivePublication[]> {
  const db = await getDb();
  return db
    .select({
      layoutId: publishedVersions.layoutId,
      name: layouts.name,
      versionNumber: publishedVersions.versionNumber,
      raceDate: publishedVersions.raceDate,
    })
    .from(publishedVersions)
    .innerJoin(layouts, eq(layouts.id, publishedVersions.layoutId))
    .where(and(eq(layouts.clubId, clubId), isNull(publishedVersions.withdrawnAt)))
    .orderBy(asc(layouts.name), desc(publishedVersions.versionNumber));
}

const versionLabel = (p: LivePublication) =>
  `version ${p.versionNumber}${p.raceDate ? ` (race day ${p.raceDate})` : ""}`;

/** The form's choices for a member on a layout. */
export async function calibrationOptions(
  layoutId: string,
  clubId: string,
  userId: string,
): Promise<CalibrationOptions> {
  const live = await livePublications(clubId);
  const own = await listProfiles(userId);
  return {
    versions: live
      .filter((p) => p.layoutId === layoutId)
      .map((p) => ({ value: String(p.versionNumber), label: versionLabel(p) })),
    others: live
      .filter((p) => p.layoutId !== layoutId)
      .map((p) => ({ value: `${p.layoutId}:${p.versionNumber}`, label: `${p.name}, ${versionLabel(p)}` })),
    cars: CAR_PRESET_IDS.map((id) => ({ value: id, label: carPreset(id)!.label })),
    ownCars: own.map((p) => ({ value: `${PROFILE_PREFIX}${p.id}`, label: p.label })),
  };
}
