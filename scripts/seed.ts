/**
 * `npm run db:seed`: adds the invented demo club, its members and layouts to the configured
 * database. Safe to run again: nothing is duplicated. Run `npm run db:migrate` first.
 */
import { closeDb, getDb } from "~/db/client.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { DEMO_CLUB_NAME, seedDemoData } from "~/db/demo-data.server";

try {
  const summary = await seedDemoData(await getDb());
  const c = summary.created;
  console.log(
    `Demo data ready: ${DEMO_CLUB_NAME} (${c.club ? "created" : "already there"}); ` +
      `new users ${c.users}, new memberships ${c.memberships}, new layouts ${c.layouts}.`,
  );
  for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(8)} ${a.email}  password: ${a.password}`);
} catch (error) {
  const message = (error as Error).message;
  const cause = String((error as { cause?: unknown }).cause ?? "");
  console.error(
    /no such table/i.test(`${message} ${cause}`)
      ? "The database has no tables yet: run `npm run db:migrate` first."
      : `Seeding the demo data failed: ${message}`,
  );
  process.exitCode = 1;
} finally {
  closeDb();
}
