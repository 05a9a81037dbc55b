import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { makeUser } from "./helpers/factories";
import { args, formRequest, getRequest, run, sessionCookie } from "./helpers/requests";
import { getUser } from "~/auth/permissions.server";
import { INVALID_CREDENTIALS_MESSAGE } from "~/auth/authenticator.server";
import {
  addressKey,
  checkThrottle,
  FAILURE_WINDOW_MS,
  MAX_FAILURES,
  purgeFailures,
  recordFailure,
} from "~/auth/throttle.server";
import { sessions, signInFailures, users } from "~/db/schema";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import * as signIn from "~/routes/sign-in";
import * as signOut from "~/routes/sign-out";
import * as signUp from "~/routes/sign-up";

const { db } = useTestDatabase();

let n = 0;
const uniqueEmail = (tag: string) => `${tag}-${++n}@club.example`;

/** The cookie a response sets, ready to send back. */
function cookieFrom(headers: Headers): string {
  const set = headers.get("Set-Cookie");
  if (!set) throw new Error("no Set-Cookie header");
  return set.split(";")[0];
}

/** A sign-in attempt; `from` is the client address the server entry would pass in the context. */
const attempt = (email: string, password: string, from: string | null = null) =>
  run(() => signIn.action(args(formRequest("/sign-in", { email, password }), {}, { clientAddress: from })));

describe("sign-up", () => {
  it("creates the account, stores only a bcrypt hash and signs the new member in", async () => {
    const email = uniqueEmail("new");
    const r = await run(() =>
      signUp.action(
        args(
          formRequest("/sign-up", {
            name: " Rita Lane ",
            email: email.toUpperCase(),
            password: "long enough pw",
            confirm: "long enough pw",
          }),
        ),
      ),
    );
    expect(r.status).toBe(302);
    expect(r.location).toBe("/clubs");
    const [row] = await (await db()).select().from(users).where(eq(users.email, email));
    expect(row.name).toBe("Rita Lane");
    expect(row.passwordHash).toMatch(/^\$2[aby]\$10\$/);
    expect(row.passwordHash).not.toContain("long enough pw");
    const me = await getUser(getRequest("/", cookieFrom(r.headers)));
    expect(me?.email).toBe(email);
  });

  it("answers 400 with an error beside each bad field and writes nothing", async () => {
    const before = (await (await db()).select({ id: users.id }).from(users)).length;
    const r = await run(() =>
      signUp.action(
        args(
          formRequest("/sign-up", { name: "", email: "not-an-address", password: "short", confirm: "other" }),
        ),
      ),
    );
    expect(r.status).toBe(400);
    const errors = (r.data as { errors: Record<string, string[]> }).errors;
    expect(errors.name).toEqual(["Enter your name."]);
    expect(errors.email[0]).toMatch(/valid e-mail address/);
    expect(errors.password[0]).toMatch(/at least 10 characters/);
    expect((await (await db()).select({ id: users.id }).from(users)).length).toBe(before);
  });

  it("refuses a taken address (any letter case) with 400 beside the e-mail field, naming no one", async () => {
    const owner = await makeUser({ email: uniqueEmail("taken"), name: "Owner Person" });
    const r = await run(() =>
      signUp.action(
        args(
          formRequest("/sign-up", {
            name: "Someone Else",
            email: owner.email.toUpperCase(),
            password: "another password",
            confirm: "another password",
          }),
        ),
      ),
    );
    expect(r.status).toBe(400);
    const body = r.data as { errors: Record<string, string[]> };
    expect(body.errors.email).toEqual([signUp.EMAIL_TAKEN_MESSAGE]);
    expect(JSON.stringify(body)).not.toContain("Owner Person");
    expect(r.headers.get("Set-Cookie")).toBeNull();
    const rows = await (
      await db()
    )
      .select({ name: users.name })
      .from(users)
      .where(eq(users.email, owner.email));
    expect(rows).toEqual([{ name: "Owner Person" }]);
  });

  it("follows a same-site redirectTo and ignores one to another site", async () => {
    const ok = await run(() =>
      signUp.action(
        args(
          formRequest("/sign-up", {
            name: "A",
            email: uniqueEmail("r1"),
            password: "0123456789",
            confirm: "0123456789",
            redirectTo: "/invitations/abc",
          }),
        ),
      ),
    );
    expect(ok.location).toBe("/invitations/abc");
    const evil = await run(() =>
      signUp.action(
        args(
          formRequest("/sign-up", {
            name: "B",
            email: uniqueEmail("r2"),
            password: "0123456789",
            confirm: "0123456789",
            redirectTo: "//evil.example/x",
          }),
        ),
      ),
    );
    expect(evil.location).toBe("/clubs");
  });

  it("sends a signed-in visitor on instead of showing the form", async () => {
    const u = await makeUser();
    const r = await run(() => signUp.loader(args(getRequest("/sign-up?redirectTo=/clubs/1", u.cookie))));
    expect(r.status).toBe(302);
    expect(r.location).toBe("/clubs/1");
  });
});

describe("sign-in", () => {
  it("signs in with the right password and follows redirectTo", async () => {
    const u = await makeUser({ email: uniqueEmail("in") });
    const r = await run(() =>
      signIn.action(
        args(
          formRequest("/sign-in", {
            email: ` ${u.email.toUpperCase()} `,
            password: u.password,
            redirectTo: "/clubs/42",
          }),
        ),
      ),
    );
    expect(r.status).toBe(302);
    expect(r.location).toBe("/clubs/42");
    expect((await getUser(getRequest("/", cookieFrom(r.headers))))?.id).toBe(u.id);
  });

  it("gives a wrong password and an unknown address the very same answer", async () => {
    const u = await makeUser({ email: uniqueEmail("wrong") });
    const wrong = await attempt(u.email, "not the password");
    const unknown = await attempt(uniqueEmail("nobody"), "not the password");
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect((wrong.data as { formError: string }).formError).toBe(INVALID_CREDENTIALS_MESSAGE);
    expect({ ...(unknown.data as object), email: "" }).toEqual({ ...(wrong.data as object), email: "" });
    expect(wrong.headers.get("Set-Cookie")).toBeNull();
  });

  it("answers 400 beside the fields for an empty form, without counting a failure", async () => {
    const r = await attempt("", "");
    expect(r.status).toBe(400);
    const errors = (r.data as { errors: Record<string, string[]> }).errors;
    expect(errors.email).toEqual(["Enter your e-mail address."]);
    expect(errors.password).toEqual(["Enter your password."]);
  });

  it("lists the demo accounts only when the development tools are on", async () => {
    const dev = await run(() => signIn.loader(args(getRequest("/sign-in"))));
    expect((dev.data as { demoAccounts: unknown[] }).demoAccounts).toEqual(DEMO_ACCOUNTS);
    const saved = { node: process.env.NODE_ENV, demo: process.env.LOFTLINE_DEMO };
    try {
      process.env.NODE_ENV = "production";
      delete process.env.LOFTLINE_DEMO;
      const prod = await run(() => signIn.loader(args(getRequest("/sign-in"))));
      expect((prod.data as { demoAccounts: unknown[] }).demoAccounts).toEqual([]);
    } finally {
      process.env.NODE_ENV = saved.node;
      if (saved.demo !== undefined) process.env.LOFTLINE_DEMO = saved.demo;
    }
  });
});

describe("the failed sign-in throttle", () => {
  it("answers 429 after 5 failures for one address, even with the right password, and says when to retry", async () => {
    const u = await makeUser({ email: uniqueEmail("throttle") });
    for (let i = 0; i < 5; i++) expect((await attempt(u.email, `guess ${i}`)).status).toBe(401);
    const blocked = await attempt(u.email, u.password);
    expect(blocked.status).toBe(429);
    expect((blocked.data as { formError: string }).formError).toMatch(/Too many failed sign-ins/);
    const retry = Number(blocked.headers.get("Retry-After"));
    expect(retry).toBeGreaterThan(14 * 60);
    expect(retry).toBeLessThanOrEqual(15 * 60);
    expect(blocked.headers.get("Set-Cookie")).toBeNull();
  });

  it("throttles an address without an account the same way (the answer reveals nothing)", async () => {
    const known = await makeUser({ email: uniqueEmail("known") });
    const unknownEmail = uniqueEmail("ghost");
    for (let i = 0; i < 5; i++) {
      await attempt(known.email, `guess ${i}`);
      await attempt(unknownEmail, `guess ${i}`);
    }
    const a = await attempt(known.email, "guess");
    const b = await attempt(unknownEmail, "guess");
    expect([a.status, b.status]).toEqual([429, 429]);
    expect({ ...(a.data as object), email: "" }).toEqual({ ...(b.data as object), email: "" });
  });

  it("does not count a successful sign-in", async () => {
    const u = await makeUser({ email: uniqueEmail("mixed") });
    for (let i = 0; i < 4; i++) expect((await attempt(u.email, `guess ${i}`)).status).toBe(401);
    expect((await attempt(u.email, u.password)).status).toBe(302);
    expect((await attempt(u.email, "guess 5")).status).toBe(401); // the 5th failure, not the 6th
    expect((await attempt(u.email, u.password)).status).toBe(429);
  });

  it("counts failures from one client address across e-mail addresses", async () => {
    const victim = await makeUser({ email: uniqueEmail("victim") });
    for (let i = 0; i < 5; i++)
      expect((await attempt(uniqueEmail("spray"), "password1", "203.0.113.7")).status).toBe(401);
    expect((await attempt(victim.email, victim.password, "203.0.113.7")).status).toBe(429);
    // Another network is not held back, and the account itself has no failures.
    expect((await attempt(victim.email, victim.password, "203.0.113.8")).status).toBe(302);
    expect((await attempt(victim.email, victim.password)).status).toBe(302);
  });

  it("counts an IPv6 client by its /64 network", async () => {
    expect(addressKey("2001:db8:1:2:aaaa::1")).toBe("2001:db8:1:2::/64");
    expect(addressKey("2001:0db8:0001:0002:ffff:0:0:9")).toBe("2001:db8:1:2::/64");
    expect(addressKey("2001:db8::1")).toBe("2001:db8:0:0::/64");
    expect(addressKey("::1")).toBe("0:0:0:0::/64");
    expect(addressKey("198.51.100.4")).toBe("198.51.100.4");
    expect(addressKey(null)).toBeNull();
    for (let i = 0; i < 5; i++)
      expect((await attempt(uniqueEmail("v6"), "password1", `2001:db8:5:6::${i + 1}`)).status).toBe(401);
    expect((await attempt(uniqueEmail("v6"), "password1", "2001:db8:5:6:ffff::9")).status).toBe(429);
    expect((await attempt(uniqueEmail("v6"), "password1", "2001:db8:5:7::1")).status).toBe(401);
  });

  it("cannot be raced: of 30 parallel wrong passwords for one address, 5 are checked", async () => {
    const u = await makeUser({ email: uniqueEmail("race") });
    const results = await Promise.all(Array.from({ length: 30 }, (_, i) => attempt(u.email, `guess ${i}`)));
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 401)).toHaveLength(MAX_FAILURES);
    expect(statuses.filter((s) => s === 429)).toHaveLength(30 - MAX_FAILURES);
    const rows = await (await db()).select().from(signInFailures).where(eq(signInFailures.email, u.email));
    expect(rows).toHaveLength(MAX_FAILURES);
  });

  it("forgets failures older than 15 minutes and purges their rows", async () => {
    const key = { email: uniqueEmail("old"), clientAddress: null };
    const now = Date.now();
    for (let i = 0; i < 5; i++) await recordFailure(key, now - FAILURE_WINDOW_MS - 60_000 + i);
    expect(await checkThrottle(key, now)).toEqual({ allowed: true });
    // The same five, one minute younger, still count.
    expect((await checkThrottle(key, now - 2 * 60_000)).allowed).toBe(false);
    await purgeFailures(now);
    const left = await (await db()).select().from(signInFailures).where(eq(signInFailures.email, key.email));
    expect(left).toEqual([]);
  });
});

describe("sign-out", () => {
  it("clears the session on POST and sends the visitor home", async () => {
    const u = await makeUser();
    const r = await run(() => signOut.action(args(formRequest("/sign-out", {}, u.cookie))));
    expect(r.status).toBe(302);
    expect(r.location).toBe("/");
    const cleared = cookieFrom(r.headers);
    expect(await getUser(getRequest("/", cleared))).toBeNull();
    expect(r.headers.get("Set-Cookie")).toMatch(/Expires=Thu, 01 Jan 1970|Max-Age=0/i);
  });

  it("ends the session on the server: a copy of the cookie stops working, other browsers stay in", async () => {
    const u = await makeUser();
    const otherBrowser = await sessionCookie(u.id);
    const copy = u.cookie; // e.g. lifted from a shared computer before signing out
    expect((await getUser(getRequest("/", copy)))?.id).toBe(u.id);
    await run(() => signOut.action(args(formRequest("/sign-out", {}, u.cookie))));
    expect(await getUser(getRequest("/", copy))).toBeNull();
    expect((await getUser(getRequest("/", otherBrowser)))?.id).toBe(u.id);
    const rows = await (await db()).select().from(sessions).where(eq(sessions.userId, u.id));
    expect(rows).toHaveLength(1);
  });

  it("starts a new session id at sign-in, ending one the browser had before", async () => {
    const u = await makeUser({ email: uniqueEmail("fixation") });
    const planted = u.cookie;
    const r = await run(() =>
      signIn.action(args(formRequest("/sign-in", { email: u.email, password: u.password }, planted))),
    );
    expect(r.status).toBe(302);
    const fresh = cookieFrom(r.headers);
    expect(fresh).not.toBe(planted);
    expect(await getUser(getRequest("/", planted))).toBeNull();
    expect((await getUser(getRequest("/", fresh)))?.id).toBe(u.id);
  });

  it("does not sign out on GET (a link cannot sign anyone out)", async () => {
    const r = await run(() => signOut.loader());
    expect(r.status).toBe(302);
    expect(r.location).toBe("/");
    expect(r.headers.get("Set-Cookie")).toBeNull();
  });
});
