/**
 * A second server of the same build and database with TRUSTED_PROXIES=loopback, as behind a
 * reverse proxy on the same machine: the client's address comes from the proxy's
 * X-Forwarded-For, and the proxy's X-Forwarded-Proto and -Host make the page's own origin.
 */
import path from "node:path";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { freePort, startAppServer, type AppServer } from "../../scripts/lib/app-server";

let app: AppServer;
beforeAll(async () => {
  const dataDir = inject("dataDir");
  app = await startAppServer({
    port: await freePort(),
    output: "ignore",
    env: {
      NODE_ENV: "production",
      LOFTLINE_INSECURE_COOKIE: "1",
      LOFTLINE_REQUEST_LOG: "0",
      DATA_DIR: dataDir,
      DATABASE_URL: `file:${path.join(dataDir, "loftline.db")}`,
      APP_URL: "https://loftline.example",
      SESSION_SECRET: "reliability-session-secret",
      TRUSTED_PROXIES: "loopback",
    },
  });
});
afterAll(async () => {
  await app?.stop();
});

const attempt = (email: string, forwardedFor: string) =>
  fetch(`${app.url}/sign-in`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", "X-Forwarded-For": forwardedFor },
    body: new URLSearchParams({ email, password: "not it" }),
  });

describe("behind a trusted proxy", () => {
  it("counts the client the proxy names, not the proxy", async () => {
    for (let i = 0; i < 5; i++) {
      expect((await attempt(`proxied-${i}@nowhere.example`, "203.0.113.50")).status).toBe(401);
    }
    // The same client through the proxy again: held back. Another client of the same proxy: not.
    // (The proxy appends the address it saw; what the client wrote before it does not count.)
    expect((await attempt("proxied-5@nowhere.example", "203.0.113.50")).status).toBe(429);
    expect((await attempt("proxied-6@nowhere.example", "1.2.3.4, 203.0.113.51")).status).toBe(401);
    expect((await attempt("proxied-7@nowhere.example", "203.0.113.50, 203.0.113.52")).status).toBe(401);
  });

  it("takes the public origin from the proxy's headers for the Origin check", async () => {
    const post = (origin: string, proto: string) =>
      fetch(`${app.url}/sign-in`, {
        method: "POST",
        headers: {
          "Content-Type": "application/x-www-form-urlencoded",
          Origin: origin,
          "X-Forwarded-Proto": proto,
          "X-Forwarded-Host": "club.example",
          "X-Forwarded-For": "203.0.113.60",
        },
        body: "email=&password=",
      });
    expect((await post("https://club.example", "https")).status).toBe(400); // reaches the form
    expect((await post("https://loftline.example", "https")).status).toBe(400); // APP_URL
    expect((await post("http://club.example", "https")).status).toBe(403);
    expect((await post("https://evil.example", "https")).status).toBe(403);
  });
});
