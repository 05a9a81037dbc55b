/**
 * The messages Loftline sends, each as plain text plus a simple HTML part. Plain words, one
 * link, and a line saying what to do if the message was not expected.
 */
import { type Role, ROLE_LABELS } from "~/lib/roles";

export type MailContent = { subject: string; text: string; html: string };

/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(s: string): string {
  return s.replace(
    /[&<>"']/g,
    (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!,
  );
}

/** Wraps paragraphs and one call-to-action link in a small, inline-styled HTML page. */
function htmlMessage(paragraphs: string[], link: { href: string; label: string }, footer: string[]): string {
  const p = (s: string) => `<p style="margin:0 0 14px">${escapeHtml(s)}</p>`;
  return [
    `<div style="font-family:Inter,Arial,sans-serif;font-size:15px;line-height:1.5;color:#141b24;max-width:520px">`,
    `<p style="margin:0 0 18px;font-weight:600;color:#1f5c4c">Loftline</p>`,
    ...paragraphs.map(p),
    `<p style="margin:18px 0"><a href="${escapeHtml(link.href)}" style="background:#1f5c4c;color:#ffffff;padding:10px 16px;border-radius:6px;text-decoration:none;display:inline-block">${escapeHtml(link.label)}</a></p>`,
    `<p style="margin:0 0 14px;font-size:13px;color:#5a6776">Or paste this address into your browser: ${escapeHtml(link.href)}</p>`,
    ...footer.map((s) => `<p style="margin:0 0 8px;font-size:13px;color:#5a6776">${escapeHtml(s)}</p>`),
    `</div>`,
  ].join("\n");
}

/** The password reset message. `expiresInMinutes` is how long the link works, minutes. */
export function passwordResetMail(input: {
  name: string;
  link: string;
  expiresInMinutes: number;
}): MailContent {
  const hours = input.expiresInMinutes % 60 === 0 ? input.expiresInMinutes / 60 : null;
  const lifetime = hours === 1 ? "one hour" : hours ? `${hours} hours` : `${input.expiresInMinutes} minutes`;
  const intro = [
    `Hello ${input.name},`,
    "Someone, hopefully you, asked to reset the password of your Loftline account.",
    `Choose a new password with the link below. It works once, within ${lifetime}.`,
  ];
  const footer = ["If you did not ask for this, ignore this message: your password stays as it is."];
  return {
    subject: "Reset your Loftline password",
    text: [...intro, "", input.link, "", ...footer].join("\n"),
    html: htmlMessage(intro, { href: input.link, label: "Choose a new password" }, footer),
  };
}

/**
 * The invitation to join a club with a role. The link signs the person up, or lets them join
 * with the account they have. `expiresInDays` is how long the link works, days (optional).
 */
export function invitationMail(input: {
  clubName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresInDays?: number;
}): MailContent {
  const role = ROLE_LABELS[input.role].toLowerCase();
  const article = /^[aeiou]/.test(role) ? "an" : "a";
  const intro = [
    "Hello,",
    `${input.inviterName} has invited you to join ${input.clubName} on Loftline as ${article} ${role}.`,
    "Loftline is where the club plans its track layouts, checks every jump before it is built, and shares the marshal plan for race day.",
    "Open the link to create your account, or to join with the account you already have.",
  ];
  const footer = [
    ...(input.expiresInDays ? [`The invitation works for ${input.expiresInDays} days.`] : []),
    "If you were not expecting this, ignore this message.",
  ];
  return {
    subject: `Join ${input.clubName} on Loftline`,
    text: [...intro, "", input.link, "", ...footer].join("\n"),
    html: htmlMessage(intro, { href: input.link, label: `Join ${input.clubName}` }, footer),
  };
}

/**
 * The message every member of the club gets when a director publishes a layout version for race
 * day: the race date, the director's note, a link to the version, and the safety cautions.
 */
export function layoutPublishedMail(input: {
  clubName: string;
  layoutName: string;
  versionNumber: number;
  raceDateText: string;
  note: string;
  link: string;
  cautions: readonly string[];
}): MailContent {
  const intro = [
    "Hello,",
    `${input.clubName} has published ${input.layoutName} (version ${input.versionNumber}) for race day ${input.raceDateText}.`,
    ...(input.note ? [`Note from the race director: ${input.note}`] : []),
    "Open it to see the plan, each jump's speed, airtime and landing, and the verdicts for your car and skill level.",
  ];
  const footer = [
    ...input.cautions,
    "You get this because you are a member of the club on Loftline. Sign in to see the layout.",
  ];
  return {
    subject: `${input.layoutName}: race day ${input.raceDateText}`,
    text: [...intro, "", input.link, "", ...footer].join("\n"),
    html: htmlMessage(intro, { href: input.link, label: `Open ${input.layoutName}` }, footer),
  };
}
