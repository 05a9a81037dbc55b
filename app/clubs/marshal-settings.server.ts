/**
 * A club's marshal settings (reach from the track edge, largest heat) stored in
 * clubs.marshal_reach and clubs.heat_size (migration 0005_marshal-settings, decision 0710).
 */
import { eq } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { clubs } from "~/db/schema";
import {
  clubMarshalSettings,
  DEFAULT_CLUB_MARSHAL,
  type ClubMarshalValues,
} from "~/lib/schemas/marshal-settings";

/** The club's values, ready for the engine (the defaults for an unknown club). */
export async function loadClubMarshal(clubId: string): Promise<ClubMarshalValues> {
  const db = await getDb();
  const [row] = await db
    .select({ reach: clubs.marshalReach, heatSize: clubs.heatSize })
    .from(clubs)
    .where(eq(clubs.id, clubId));
  return row ? clubMarshalSettings(row) : { ...DEFAULT_CLUB_MARSHAL };
}

/** Stores both values in one statement. */
export async function saveClubMarshal(clubId: string, values: ClubMarshalValues): Promise<void> {
  const db = await getDb();
  await db
    .update(clubs)
    .set({ marshalReach: values.reach, heatSize: values.heatSize })
    .where(eq(clubs.id, clubId));
}
