/**
 * Security headers on every answer (helmet): a Content-Security-Policy whose scripts need this
 * response's nonce (the framework's inline scripts carry it, see app/entry.server.tsx), no
 * framing, no MIME sniffing, no Referer to other sites (none at all from the token pages, whose
 * address holds a reset or invitation token), and HSTS in production.
 * See docs/decisions/0313-security-headers.md.
 */
import type { IncomingMessage, ServerResponse } from "node:http";
import helmet from "helmet";

/** Route ids of pages whose address carries a secret token. */
export const TOKEN_ROUTES: ReadonlySet<string> = new Set(["routes/reset-password", "routes/invitation"]);

/** One year, s: the usual HSTS lifetime. */
const HSTS_SECONDS = 365 * 24 * 60 * 60;

export function securityHeaders(opts: { production: boolean }) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: [
          "'self'",
          (_req: IncomingMessage, res: ServerResponse) =>
            `'nonce-${(res as ServerResponse & { locals: { cspNonce: string } }).locals.cspNonce}'`,
        ],
        // React writes style attributes (positions, colours of the drawing); no inline <style>.
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", "data:", "blob:"],
        fontSrc: ["'self'", "data:"],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'none'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
      },
    },
    strictTransportSecurity: opts.production ? { maxAge: HSTS_SECONDS, includeSubDomains: true } : false,
    referrerPolicy: { policy: "same-origin" },
    xFrameOptions: { action: "deny" },
    crossOriginOpenerPolicy: { policy: "same-origin" },
    crossOriginResourcePolicy: { policy: "same-origin" },
  });
}
