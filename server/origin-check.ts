/**
 * The one cross-site check for every state-changing request (POST, PUT, PATCH, DELETE): forms,
 * the JSON API and uploads alike. A browser says where a request comes from in `Origin` (and in
 * `Sec-Fetch-Site`); the request passes when that is the app's own origin: APP_URL's, or the
 * origin the request itself was addressed to. Requests without either header come from programs
 * (curl, scripts), which carry no one else's cookie. See docs/decisions/0312-origin-check.md.
 */
import type { Request as ExpressRequest } from "express";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * The origin the request was addressed to, from its Host header (X-Forwarded-Proto and -Host
 * only from trusted proxies); anything after a character that cannot be in a host is dropped.
 */
export function requestOrigin(req: ExpressRequest): string {
  const host = (req.host || "localhost").split(/[\\/?#@\s]/)[0] || "localhost";
  return `${req.protocol}://${host}`;
}

/** Whether a request may go on; `appOrigin` is APP_URL's origin. */
export function originAllowed(req: ExpressRequest, appOrigin: string): boolean {
  if (SAFE_METHODS.has(req.method)) return true;
  const origin = req.headers.origin;
  const site = req.headers["sec-fetch-site"];
  if (origin !== undefined && origin !== "null") {
    return origin === appOrigin || origin === requestOrigin(req);
  }
  // "null": a page with Referrer-Policy no-referrer (the token pages) posting its own form, or a
  // sandboxed frame. Only the browser's own Sec-Fetch-Site tells the two apart.
  if (origin === "null") return site === "same-origin";
  return site === undefined || site === "same-origin";
}

export const CROSS_SITE_MESSAGE =
  "This request came from another site (or another port of this one) and was refused. " +
  "Open Loftline itself and try again.";
