/** A club's default car classes: what a new layout of the club is analysed for (clubs.default_car_classes). */
import { eq } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { clubs } from "~/db/schema";
import { DEFAULT_CAR_CLASSES, readCarClasses } from "~/lib/car-classes";

/** The club's default classes (the product's default when none are stored or the club is gone). */
export async function loadClubCarClasses(clubId: string): Promise<string[]> {
  const db = await getDb();
  const [row] = await db
    .select({ defaultCarClasses: clubs.defaultCarClasses })
    .from(clubs)
    .where(eq(clubs.id, clubId));
  return readCarClasses(row?.defaultCarClasses) ?? [...DEFAULT_CAR_CLASSES];
}

/** Stores the club's default classes (already checked by the form's schema). */
export async function saveClubCarClasses(clubId: string, carClasses: string[]): Promise<void> {
  const db = await getDb();
  await db
    .update(clubs)
    .set({ defaultCarClasses: JSON.stringify(carClasses) })
    .where(eq(clubs.id, clubId));
}
