/**
 * Members' own car profiles (docs/decisions/0802-own-car-profiles.md). Only the owner reads or
 * changes one: every query names the owner, and someone else's profile is answered like one that
 * does not exist (404), so ids reveal nothing.
 */
import { createHash } from "node:crypto";
import { and, asc, eq, sql } from "drizzle-orm";
import {
  CAR_NUMBER_FIELDS,
  carFromProfile,
  carPreset,
  carProfileSchema,
  profileFromCar,
  type CarParams,
  type CarProfile,
} from "~/analysis";
import { RuleError } from "~/clubs/rule-error.server";
import { getDb } from "~/db/client.server";
import { carProfiles } from "~/db/schema";

/** Most profiles one member keeps. */
export const MAX_PROFILES_PER_MEMBER = 50;

export type StoredProfile = {
  id: string;
  presetId: string;
  profile: CarProfile;
  createdAt: Date;
  updatedAt: Date;
};

export type ProfileListItem = { id: string; label: string; presetId: string; updatedAt: Date };

const NOT_FOUND = "No such car profile of yours.";

function readProfile(text: string): CarProfile | null {
  try {
    const parsed = carProfileSchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** The member's profiles by name. */
export async function listProfiles(userId: string): Promise<ProfileListItem[]> {
  const db = await getDb();
  const rows = await db
    .select({
      id: carProfiles.id,
      presetId: carProfiles.presetId,
      profile: carProfiles.profile,
      updatedAt: carProfiles.updatedAt,
    })
    .from(carProfiles)
    .where(eq(carProfiles.userId, userId))
    .orderBy(asc(carProfiles.createdAt));
  return rows
    .map((r) => ({
      id: r.id,
      presetId: r.presetId,
      updatedAt: r.updatedAt,
      label: readProfile(r.profile)?.label,
    }))
    .filter((r): r is ProfileListItem => r.label !== undefined)
    .sort((a, b) => a.label.localeCompare(b.label));
}

/** The member's own profile, or null (unknown, someone else's, or unreadable). */
export async function getOwnProfile(userId: string, id: string): Promise<StoredProfile | null> {
  const db = await getDb();
  const [row] = await db
    .select({
      id: carProfiles.id,
      presetId: carProfiles.presetId,
      profile: carProfiles.profile,
      createdAt: carProfiles.createdAt,
      updatedAt: carProfiles.updatedAt,
    })
    .from(carProfiles)
    .where(and(eq(carProfiles.id, id), eq(carProfiles.userId, userId)));
  const profile = row ? readProfile(row.profile) : null;
  return row && profile ? { ...row, profile } : null;
}

/** A new profile (409 beyond MAX_PROFILES_PER_MEMBER); `presetId` must be a class preset. */
export async function createProfile(userId: string, presetId: string, profile: CarProfile) {
  if (!carPreset(presetId)) throw new RuleError(400, "Choose a car class to start from.", "preset");
  const db = await getDb();
  const [count] = await db
    .select({ n: sql<number>`count(*)` })
    .from(carProfiles)
    .where(eq(carProfiles.userId, userId));
  if (count.n >= MAX_PROFILES_PER_MEMBER)
    throw new RuleError(409, `You keep ${MAX_PROFILES_PER_MEMBER} car profiles already: delete one first.`);
  const [row] = await db
    .insert(carProfiles)
    .values({ userId, presetId, profile: JSON.stringify(profile) })
    .returning({ id: carProfiles.id });
  return row;
}

/** Replaces the profile's values (404 when it is not the member's). */
export async function updateProfile(userId: string, id: string, profile: CarProfile): Promise<void> {
  const db = await getDb();
  const rows = await db
    .update(carProfiles)
    .set({ profile: JSON.stringify(profile) })
    .where(and(eq(carProfiles.id, id), eq(carProfiles.userId, userId)))
    .returning({ id: carProfiles.id });
  if (rows.length === 0) throw new RuleError(404, NOT_FOUND);
}

/** Deletes the profile (404 when it is not the member's); returns its name. */
export async function deleteProfile(userId: string, id: string): Promise<string> {
  const found = await getOwnProfile(userId, id);
  if (!found) throw new RuleError(404, NOT_FOUND);
  const db = await getDb();
  await db.delete(carProfiles).where(and(eq(carProfiles.id, id), eq(carProfiles.userId, userId)));
  return found.profile.label;
}

/** The preset's values as a profile (degrees), named after the class. */
export function presetProfile(presetId: string): CarProfile | null {
  const preset = carPreset(presetId);
  return preset ? profileFromCar(preset) : null;
}

const valueAt = (p: CarProfile, path: readonly (string | number)[]) =>
  path.reduce<unknown>((v, k) => (v as Record<string | number, unknown>)[k], p) as number;

/**
 * The fields still at the class preset's value (to 0.01 %): estimates, not measurements. The form
 * shows values to six digits, so saving an untouched form keeps them marked.
 */
export function estimatedFields(presetId: string, profile: CarProfile): string[] {
  const preset = presetProfile(presetId);
  if (!preset) return [];
  return CAR_NUMBER_FIELDS.filter((f) => {
    const a = valueAt(profile, f.path);
    const b = valueAt(preset, f.path);
    return Math.abs(a - b) <= 1e-4 * Math.max(Math.abs(a), Math.abs(b), 1e-12);
  }).map((f) => f.name);
}

/**
 * The profile as the engine's car, under a class id made from the profile's content ("own-" and
 * 16 hex digits of its SHA-256): the analysis memo then keys on what the car is, not which row.
 */
export function ownCar(stored: Pick<StoredProfile, "presetId" | "profile">): {
  classId: string;
  car: CarParams;
} {
  const hash = createHash("sha256")
    .update(JSON.stringify([stored.presetId, stored.profile]))
    .digest("hex")
    .slice(0, 16);
  const classId = `own-${hash}`;
  const car = carFromProfile(stored.profile, classId);
  const estimates = estimatedFields(stored.presetId, stored.profile).length;
  return {
    classId,
    car: {
      ...car,
      estimate: estimates > 0,
      notes: estimates
        ? `Entered by the car's owner; ${estimates} value(s) still the class preset's estimates.`
        : car.notes,
    },
  };
}
