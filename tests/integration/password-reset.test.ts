import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { makeClub, makeLayout, makeUser } from "./helpers/factories";
import { extractLink, extractPath, mailsTo, useFakeSmtp, waitForMail } from "./helpers/mail";
import { args, formRequest, getRequest, run } from "./helpers/requests";
import { getUser } from "~/auth/permissions.server";
import {
  hashToken,
  MAX_RESETS_PER_LIFETIME,
  requestPasswordReset,
  RESET_TOKEN_LIFETIME_MS,
} from "~/auth/password-reset.server";
import { passwordResets } from "~/db/schema";
import { apiLayoutAccess } from "~/layouts/api-access.server";
import * as forgot from "~/routes/forgot-password";
import * as reset from "~/routes/reset-password";
import * as signIn from "~/routes/sign-in";

const { db } = useTestDatabase();
useFakeSmtp();

const SUBJECT = "Reset your Loftline password";
let n = 0;
const uniqueEmail = (tag: string) => `${tag}-${++n}@club.example`;

const askForReset = (email: string) =>
  run(() => forgot.action(args(formRequest("/forgot-password", { email }))));
const tokenOf = (path: string) => decodeURIComponent(path.split("/").pop()!);
const openLink = (path: string) => run(() => reset.loader(args(getRequest(path), { token: tokenOf(path) })));
const submitNew = (path: string, password: string, confirm = password) =>
  run(() => reset.action(args(formRequest(path, { password, confirm }), { token: tokenOf(path) })));
const signInStatus = async (email: string, password: string) =>
  (await run(() => signIn.action(args(formRequest("/sign-in", { email, password }))))).status;

describe("password reset by e-mail", () => {
  it("full flow: request, the mail arrives, the link works once and signs the member in", async () => {
    const u = await makeUser({ email: uniqueEmail("reset"), name: "Rosa Reset" });
    const asked = await askForReset(u.email.toUpperCase());
    expect(asked.status).toBe(200);

    const mail = await waitForMail(u.email, SUBJECT);
    expect(mail.text).toContain("Hello Rosa Reset");
    expect(mail.html).toContain(extractLink(mail.text));
    const path = extractPath(mail.text);
    expect(path).toMatch(/^\/reset-password\/[A-Za-z0-9_-]{43}$/);

    // Only the SHA-256 of the token is stored.
    const rows = await (await db()).select().from(passwordResets).where(eq(passwordResets.userId, u.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).toBe(hashToken(tokenOf(path)));
    expect(JSON.stringify(rows)).not.toContain(tokenOf(path));
    expect(rows[0].expiresAt.getTime() - rows[0].createdAt.getTime()).toBe(RESET_TOKEN_LIFETIME_MS);

    expect((await openLink(path)).status).toBe(200);
    expect(reset.headers({} as never)).toEqual({ "Referrer-Policy": "no-referrer" });

    const mismatch = await submitNew(path, "brand new password", "brand new passw0rd");
    expect(mismatch.status).toBe(400);
    expect((mismatch.data as { errors: Record<string, string[]> }).errors.confirm).toEqual([
      "The two passwords do not match.",
    ]);
    expect((await openLink(path)).status).toBe(200); // a bad form does not use up the link

    const done = await submitNew(path, "brand new password");
    expect(done.status).toBe(302);
    expect(done.location).toBe("/clubs");
    const cookie = done.headers.get("Set-Cookie")!.split(";")[0];
    expect((await getUser(getRequest("/", cookie)))?.id).toBe(u.id);

    expect(await signInStatus(u.email, "brand new password")).toBe(302);
    expect(await signInStatus(u.email, u.password)).toBe(401);
  });

  it("signs out every other browser: a session from before the reset no longer counts", async () => {
    const u = await makeUser({ email: uniqueEmail("elsewhere") });
    // u.cookie stands for a browser signed in before the reset (say, a lost phone).
    expect((await getUser(getRequest("/", u.cookie)))?.id).toBe(u.id);
    await askForReset(u.email);
    const path = extractPath((await waitForMail(u.email, SUBJECT)).text);
    const done = await submitNew(path, "another new password");
    expect(done.status).toBe(302);
    const fresh = done.headers.get("Set-Cookie")!.split(";")[0];

    expect(await getUser(getRequest("/", u.cookie))).toBeNull();
    expect((await getUser(getRequest("/", fresh)))?.id).toBe(u.id);
    const club = await makeClub(u.id);
    const layout = await makeLayout(club.id);
    const api = (cookie: string) =>
      run(() => apiLayoutAccess(getRequest(`/api/layouts/${layout.id}/analysis`, cookie), layout.id));
    expect((await api(u.cookie)).status).toBe(401);
    expect((await api(fresh)).status).toBe(200);
    // Signing in again with the new password gives a session that counts.
    const again = await run(() =>
      signIn.action(args(formRequest("/sign-in", { email: u.email, password: "another new password" }))),
    );
    expect((await getUser(getRequest("/", again.headers.get("Set-Cookie")!.split(";")[0])))?.id).toBe(u.id);
  });

  it("refuses a used link with 410 and changes nothing", async () => {
    const u = await makeUser({ email: uniqueEmail("reuse") });
    await askForReset(u.email);
    const path = extractPath((await waitForMail(u.email, SUBJECT)).text);
    expect((await submitNew(path, "first new password")).status).toBe(302);

    const again = await submitNew(path, "second new password");
    expect(again.status).toBe(410);
    expect((again.data as { problem: string }).problem).toMatch(/already been used/);
    const page = await openLink(path);
    expect(page.status).toBe(410);
    expect(await signInStatus(u.email, "first new password")).toBe(302);
    expect(await signInStatus(u.email, "second new password")).toBe(401);
  });

  it("lets exactly one of two simultaneous submissions with one link win", async () => {
    const u = await makeUser({ email: uniqueEmail("race") });
    await askForReset(u.email);
    const path = extractPath((await waitForMail(u.email, SUBJECT)).text);
    const [a, b] = await Promise.all([
      submitNew(path, "password from tab A"),
      submitNew(path, "password from tab B"),
    ]);
    expect([a.status, b.status].sort()).toEqual([302, 410]);
    const winner = a.status === 302 ? "password from tab A" : "password from tab B";
    expect(await signInStatus(u.email, winner)).toBe(302);
  });

  it("refuses an expired link (older than one hour) with 410 and changes nothing", async () => {
    const u = await makeUser({ email: uniqueEmail("expired") });
    const issuedAt = Date.now() - RESET_TOKEN_LIFETIME_MS - 1000;
    expect(await requestPasswordReset(u.email, issuedAt)).toBe(true);
    const path = extractPath((await waitForMail(u.email, SUBJECT)).text);

    const page = await openLink(path);
    expect(page.status).toBe(410);
    expect((page.data as { problem: string }).problem).toMatch(/expired/);
    const tried = await submitNew(path, "too late password");
    expect(tried.status).toBe(410);
    expect(await signInStatus(u.email, u.password)).toBe(302);
  });

  it("answers 404 for a token that was never issued", async () => {
    const path = "/reset-password/not-a-real-token-at-all";
    expect((await openLink(path)).status).toBe(404);
    const tried = await submitNew(path, "whatever password");
    expect(tried.status).toBe(404);
    expect((tried.data as { problem: string }).problem).toMatch(/not valid/);
  });

  it("once one link is used, the member's other open links stop working", async () => {
    const u = await makeUser({ email: uniqueEmail("two-links") });
    await askForReset(u.email);
    const first = extractPath((await waitForMail(u.email, SUBJECT)).text);
    const since = new Date();
    await askForReset(u.email);
    const second = extractPath((await waitForMail(u.email, SUBJECT, { since })).text);
    expect(second).not.toBe(first);
    expect((await submitNew(second, "newest password")).status).toBe(302);
    expect((await submitNew(first, "older link password")).status).toBe(410);
  });

  it("gives an unknown address the same answer as a known one, and sends nothing", async () => {
    const known = await makeUser({ email: uniqueEmail("known") });
    const unknownEmail = uniqueEmail("unknown");
    const a = await askForReset(known.email);
    const b = await askForReset(unknownEmail);
    expect(a.status).toBe(b.status);
    expect({ ...(a.data as object), email: "" }).toEqual({ ...(b.data as object), email: "" });
    await waitForMail(known.email, SUBJECT);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailsTo(unknownEmail)).toEqual([]);
  });

  it("answers 400 beside the field for a malformed address", async () => {
    const r = await askForReset("dana at kestrel");
    expect(r.status).toBe(400);
    expect((r.data as { errors: Record<string, string[]> }).errors.email[0]).toMatch(/valid e-mail address/);
  });

  it(`sends at most ${MAX_RESETS_PER_LIFETIME} reset e-mails per account an hour, answering the same`, async () => {
    const u = await makeUser({ email: uniqueEmail("flood") });
    // All at once: the cap must hold when requests race, too.
    const answers = await Promise.all(
      Array.from({ length: MAX_RESETS_PER_LIFETIME + 3 }, () => askForReset(u.email)),
    );
    expect(new Set(answers.map((a) => a.status))).toEqual(new Set([200]));
    await waitForMail(u.email, SUBJECT);
    await new Promise((r) => setTimeout(r, 800));
    expect(await mailsTo(u.email)).toHaveLength(MAX_RESETS_PER_LIFETIME);
  });
});
