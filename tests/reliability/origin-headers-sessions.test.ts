/**
 * Through the real server: the one Origin check in front of every state-changing request (forms,
 * the API, uploads, sign-out); the security headers (CSP with a fresh nonce on every inline
 * script, no framing, nosniff, Referrer-Policy, HSTS in production); signing out ends the session
 * for every copy of the cookie.
 */
import { beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { demoIds, send, serverPort, signIn, storedPhotos } from "./client";

const director = DEMO_ACCOUNTS.find((a) => a.role === "director")!;
const driver = DEMO_ACCOUNTS.find((a) => a.role === "driver")!;
const FORM = { "Content-Type": "application/x-www-form-urlencoded" };
/** A page on another port of the same host: same site, another origin. */
const OTHER_PORT = () => `http://localhost:${serverPort() + 1}`;
const OWN = () => new URL(inject("baseUrl")).origin;

let cookie = "";
let layoutId = "";

beforeAll(async () => {
  cookie = await signIn(director.email, director.password, "127.0.0.50");
  ({ layoutId } = await demoIds());
});

describe("the Origin check", () => {
  const png = Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    Buffer.alloc(100, 1),
  ]);
  const photoBody = Buffer.concat([
    Buffer.from(
      '--b\r\nContent-Disposition: form-data; name="photo"; filename="p.png"\r\nContent-Type: image/png\r\n\r\n',
    ),
    png,
    Buffer.from("\r\n--b--\r\n"),
  ]);
  const photo = (headers: Record<string, string>) =>
    send(`/layouts/${layoutId}/photo`, {
      headers: { "Content-Type": "multipart/form-data; boundary=b", Cookie: cookie, ...headers },
      body: photoBody,
    });

  it("refuses a photo upload from a page on another port, and stores nothing", async () => {
    const photosBefore = storedPhotos();
    const refused = await photo({ Origin: OTHER_PORT() });
    expect(refused.status).toBe(403);
    expect(JSON.parse(refused.text).error).toMatch(/another site/);
    expect(storedPhotos()).toBe(photosBefore);
    // The app's own page may upload.
    expect((await photo({ Origin: OWN() })).status).toBe(201);
    expect(storedPhotos()).toBe(photosBefore + 1);
  });

  it.each([
    ["a form", "/sign-in", FORM, "email=a%40b.example&password=x"],
    ["a form sent by script", "/clubs.data", FORM, "name=Evil+club"],
    ["the analysis API", "/api/analysis", { "Content-Type": "application/json" }, '{"document":{}}'],
    ["sign-out", "/sign-out", FORM, ""],
  ])("refuses %s from another origin with 403", async (_what, target, headers, body) => {
    for (const origin of [OTHER_PORT(), "https://evil.example", "null"]) {
      const answer = await send(target, { headers: { ...headers, Cookie: cookie, Origin: origin }, body });
      expect(answer.status, `${target} from ${origin}`).toBe(403);
    }
    // Still signed in: the refused sign-out did nothing.
    expect((await send("/clubs", { method: "GET", headers: { Cookie: cookie } })).status).toBe(200);
  });

  it("uses Sec-Fetch-Site when there is no usable Origin", async () => {
    const post = (headers: Record<string, string>) =>
      send("/sign-in", { headers: { ...FORM, ...headers }, body: "email=&password=", from: "127.0.0.51" });
    expect((await post({ "Sec-Fetch-Site": "same-site" })).status).toBe(403);
    expect((await post({ "Sec-Fetch-Site": "cross-site" })).status).toBe(403);
    // A token page (no-referrer) posts its own form with Origin "null": the browser's
    // Sec-Fetch-Site says it is the same origin, so it reaches the form (400: empty fields).
    expect((await post({ Origin: "null", "Sec-Fetch-Site": "same-origin" })).status).toBe(400);
    expect((await post({ Origin: OWN(), "Sec-Fetch-Site": "same-origin" })).status).toBe(400);
    // Programs (curl, scripts) send neither header.
    expect((await post({})).status).toBe(400);
  });
});

describe("security headers", () => {
  it("every inline script of a page carries this response's CSP nonce; nonces differ", async () => {
    const nonces: string[] = [];
    for (const target of ["/", "/sign-in"]) {
      const page = await send(target, { method: "GET" });
      const csp = String(page.headers["content-security-policy"]);
      const nonce = /script-src 'self' 'nonce-([^']+)'/.exec(csp)?.[1];
      expect(nonce, csp).toBeTruthy();
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).not.toContain("unsafe-eval");
      const scripts = [...page.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(2);
      for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
      nonces.push(nonce!);
    }
    expect(new Set(nonces).size).toBe(2);
  });

  it("a reader page kept rendered gets each answer's own nonce, never another's", async () => {
    const nonces: string[] = [];
    for (let i = 0; i < 3; i++) {
      const page = await send(`/layouts/${layoutId}`, { method: "GET", headers: { Cookie: cookie } });
      expect(page.status).toBe(200);
      const nonce = /script-src 'self' 'nonce-([^']+)'/.exec(
        String(page.headers["content-security-policy"]),
      )?.[1];
      const scripts = [...page.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(2);
      for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
      expect(page.text).not.toContain("LoftlineNonceSlot");
      nonces.push(nonce!);
    }
    expect(new Set(nonces).size).toBe(3);
  });

  it("no framing, no sniffing, same-origin referrers, HSTS in production, on pages and the API", async () => {
    for (const target of ["/", "/api/health", `/api/layouts/${layoutId}`]) {
      const answer = await send(target, { method: "GET", headers: { Cookie: cookie } });
      expect(answer.headers["x-content-type-options"]).toBe("nosniff");
      expect(answer.headers["x-frame-options"]).toBe("DENY");
      expect(answer.headers["referrer-policy"]).toBe("same-origin");
      expect(answer.headers["strict-transport-security"]).toMatch(/max-age=31536000/);
    }
  });

  it("token pages send no Referer anywhere", async () => {
    for (const target of [`/reset-password/${"x".repeat(43)}`, `/invitations/${"x".repeat(43)}`]) {
      const answer = await send(target, { method: "GET" });
      expect(answer.headers["referrer-policy"], target).toBe("no-referrer");
    }
  });
});

describe("signing out", () => {
  it("ends the session on the server: a copied cookie no longer opens pages or the API", async () => {
    const mine = await signIn(driver.email, driver.password, "127.0.0.52");
    const copy = mine;
    expect((await send("/clubs", { method: "GET", headers: { Cookie: copy } })).status).toBe(200);
    const out = await send("/sign-out", { headers: { ...FORM, Cookie: mine, Origin: OWN() }, body: "" });
    expect(out.status).toBe(302);
    const page = await send("/clubs", { method: "GET", headers: { Cookie: copy } });
    expect(page.status).toBe(302);
    expect(page.headers.location).toMatch(/^\/sign-in/);
    const api = await send(`/api/layouts/${layoutId}`, { method: "GET", headers: { Cookie: copy } });
    expect(api.status).toBe(401);
  });
});
