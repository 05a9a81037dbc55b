/** Dates as the publishing pages and e-mails write them ("Sat 12 Jul 2026"), in UTC. */
const dayFormat = new Intl.DateTimeFormat("en-GB", {
  weekday: "short",
  day: "numeric",
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

/** A race date "YYYY-MM-DD" as words; null stays "no race date". */
export function raceDateText(iso: string | null): string {
  if (!iso) return "no race date";
  const t = Date.parse(`${iso}T00:00:00Z`);
  return Number.isNaN(t) ? iso : dayFormat.format(new Date(t));
}

/** A moment (a Date or its ISO text) as its day. */
export function dayText(value: Date | string): string {
  return dayFormat.format(new Date(value));
}
