/**
 * Through the real server: redirect targets that would leave the site are replaced by a path of
 * the app's own; the sign-in throttle holds under 30 parallel guesses, counts the socket's address
 * (a forged X-Forwarded-For changes nothing) and says when to retry.
 */
import { beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { send, signIn } from "./client";

const director = DEMO_ACCOUNTS.find((a) => a.role === "director")!;
const marshal = DEMO_ACCOUNTS.find((a) => a.role === "marshal")!;
const FORM = { "Content-Type": "application/x-www-form-urlencoded" };
const form = (fields: Record<string, string>) => new URLSearchParams(fields).toString();

/** Where a Location header sends a browser. */
function landsOn(location: string | undefined): URL {
  return new URL(location ?? "", inject("baseUrl"));
}

describe("redirect targets", () => {
  let cookie = "";
  beforeAll(async () => {
    cookie = await signIn(director.email, director.password, "127.0.0.20");
  });

  // Raw query strings, as an attacker would write them in a link.
  const hostile = [
    "/%5Cevil.example",
    "/%09/evil.example",
    "/%0D%0A/evil.example",
    "//evil.example",
    "/%2F%2Fevil.example",
    "/..//evil.example",
    "/%5C%5Cevil.example/x",
    "https://evil.example/",
    "javascript:alert(1)",
    "/\\evil.example",
  ];

  it.each(hostile)("a signed-in visitor of /sign-in?redirectTo=%s stays on the site", async (target) => {
    const answer = await send(`/sign-in?redirectTo=${target}`, {
      method: "GET",
      headers: { Cookie: cookie },
    });
    expect(answer.status).toBe(302);
    const url = landsOn(answer.headers.location);
    expect(url.origin).toBe(new URL(inject("baseUrl")).origin);
    expect(url.pathname).toBe("/clubs");
  });

  it("a same-site target is followed as given", async () => {
    const answer = await send("/sign-in?redirectTo=%2Flayouts%2Fabc%3Fskill%3Dexpert", {
      method: "GET",
      headers: { Cookie: cookie },
    });
    expect(answer.headers.location).toBe("/layouts/abc?skill=expert");
  });

  it("signing in with a hostile redirectTo lands on the site", async () => {
    for (const redirectTo of ["/\\evil.example", "/\t/evil.example", "/clubs/../..//evil.example"]) {
      const answer = await send("/sign-in", {
        headers: FORM,
        body: form({ email: marshal.email, password: marshal.password, redirectTo }),
        from: "127.0.0.21",
      });
      expect(answer.status).toBe(302);
      expect(landsOn(answer.headers.location).origin).toBe(new URL(inject("baseUrl")).origin);
      expect(landsOn(answer.headers.location).pathname).toBe("/clubs");
    }
  });
});

describe("the sign-in throttle", () => {
  it("30 parallel wrong passwords for one address: 5 are checked, 25 get 429 with Retry-After", async () => {
    // An account of its own: the accounts other test files sign in with stay unthrottled.
    const email = `race-${Date.now()}@nowhere.example`;
    const password = "a long enough password";
    const created = await send("/sign-up", {
      headers: FORM,
      body: form({ name: "Race Tester", email, password, confirm: password }),
      from: "127.0.0.29",
    });
    expect(created.status).toBe(302);
    const answers = await Promise.all(
      Array.from({ length: 30 }, (_, i) =>
        send(i % 2 ? "/sign-in" : "/sign-in.data", {
          headers: FORM,
          body: form({ email, password: `guess ${i}` }),
          from: "127.0.0.30",
        }),
      ),
    );
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(25);
    for (const a of answers.filter((x) => x.status === 429)) {
      const retry = Number(a.headers["retry-after"]);
      expect(retry).toBeGreaterThan(14 * 60);
      expect(retry).toBeLessThanOrEqual(15 * 60);
    }
    // The right password now waits too, from any client.
    const right = await send("/sign-in", {
      headers: FORM,
      body: form({ email, password }),
      from: "127.0.0.31",
    });
    expect(right.status).toBe(429);
  });

  it("counts the socket's address: a forged X-Forwarded-For does not make a new client", async () => {
    for (let i = 0; i < 5; i++) {
      const answer = await send("/sign-in", {
        headers: { ...FORM, "X-Forwarded-For": `198.51.100.${i + 1}` },
        body: form({ email: `spray-${i}@nowhere.example`, password: "password1" }),
        from: "127.0.0.40",
      });
      expect(answer.status).toBe(401);
    }
    const sixth = await send("/sign-in", {
      headers: { ...FORM, "X-Forwarded-For": "203.0.113.99" },
      body: form({ email: marshal.email, password: marshal.password }),
      from: "127.0.0.40",
    });
    expect(sixth.status).toBe(429);
    expect(Number(sixth.headers["retry-after"])).toBeGreaterThan(0);
    // The same account from another client is not held back.
    const elsewhere = await send("/sign-in", {
      headers: FORM,
      body: form({ email: marshal.email, password: marshal.password }),
      from: "127.0.0.41",
    });
    expect(elsewhere.status).toBe(302);
  });
});
