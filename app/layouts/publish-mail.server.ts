/**
 * Tells every member of the club that a layout version was published for race day: one message
 * each, through the mail module (the local fake SMTP listener in development, any provider in
 * production). Sent after the publication is committed; a failed send does not undo it.
 */
import { eq } from "drizzle-orm";
import { SAFETY_CAUTIONS } from "~/components/cautions";
import { getDb } from "~/db/client.server";
import { memberships, users } from "~/db/schema";
import { config } from "~/lib/config.server";
import { raceDateText } from "~/lib/race-date";
import { sendMail } from "~/mail/mail.server";
import { layoutPublishedMail } from "~/mail/templates.server";

/** Members sent to at once: enough to be quick, few enough for a provider's connection limit. */
const AT_ONCE = 5;

/** Sends the message to every member of the club; returns how many were sent and how many failed. */
export async function mailPublication(input: {
  clubId: string;
  clubName: string;
  layoutId: string;
  layoutName: string;
  versionNumber: number;
  raceDate: string;
  note: string;
}): Promise<{ sent: number; failed: number }> {
  const db = await getDb();
  const members = await db
    .select({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.clubId, input.clubId));
  const link = new URL(`/layouts/${input.layoutId}?version=${input.versionNumber}`, config.appUrl).toString();
  const content = layoutPublishedMail({
    clubName: input.clubName,
    layoutName: input.layoutName,
    versionNumber: input.versionNumber,
    raceDateText: raceDateText(input.raceDate),
    note: input.note,
    link,
    cautions: SAFETY_CAUTIONS,
  });
  let sent = 0;
  let failed = 0;
  for (let i = 0; i < members.length; i += AT_ONCE) {
    const batch = members.slice(i, i + AT_ONCE);
    const results = await Promise.allSettled(batch.map((m) => sendMail({ to: m.email, ...content })));
    for (const r of results) {
      if (r.status === "fulfilled") sent += 1;
      else {
        failed += 1;
        console.error("[loftline] publication e-mail failed:", (r.reason as Error).message);
      }
    }
  }
  return { sent, failed };
}
