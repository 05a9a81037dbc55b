/**
 * The production server's request pipeline (express): per-response CSP nonce and security
 * headers, compression, the built browser files, then the app through the framework's handler
 * with the body rules and the Origin check (server/react-router-handler.ts).
 */
import { randomBytes } from "node:crypto";
import path from "node:path";
import compression from "compression";
import express, { type NextFunction, type Request, type Response } from "express";
import morgan from "morgan";
import type { ServerBuild } from "react-router";
import { reactRouterHandler } from "./react-router-handler";
import { securityHeaders } from "./security-headers";

export type ServerOptions = {
  build: ServerBuild;
  /** The built browser files (build/client). */
  clientDir: string;
  /** The public address (APP_URL). */
  appUrl: string;
  production: boolean;
  /** express's `trust proxy`: false, a number of hops, or addresses, subnets and names. */
  trustProxy: false | number | string[];
  /** CLIENT_ADDRESS_HEADER (see server/client-address.ts). */
  clientAddressHeader: string | undefined;
  /** Log each request to stdout (morgan "tiny"). */
  log: boolean;
};

export function createServerApp(opts: ServerOptions): express.Express {
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", opts.trustProxy);
  const trusted = app.get("trust proxy fn") as (address: string, hop: number) => boolean;

  app.use((_req, res, next) => {
    res.locals.cspNonce = randomBytes(16).toString("base64");
    next();
  });
  app.use(securityHeaders({ production: opts.production }));
  app.use(compression());
  // Hashed file names: cache for a year.
  app.use(
    "/assets",
    express.static(path.join(opts.clientDir, "assets"), { immutable: true, maxAge: "1y", index: false }),
  );
  app.use(express.static(opts.clientDir, { maxAge: "1h", index: false }));
  if (opts.log) app.use(morgan("tiny"));
  app.use(
    reactRouterHandler({
      build: opts.build,
      mode: opts.production ? "production" : "development",
      appOrigin: new URL(opts.appUrl).origin,
      clientAddress: {
        header: opts.clientAddressHeader?.trim().toLowerCase() || undefined,
        trusted: (address) => trusted(address, 0),
      },
    }),
  );
  app.use((error: unknown, _req: Request, res: Response, _next: NextFunction) => {
    console.error(error);
    if (res.headersSent) {
      res.destroy();
      return;
    }
    res.status(500).type("text/plain").send("Something went wrong on the server. Try again in a moment.");
  });
  return app;
}

/**
 * TRUSTED_PROXIES as express's `trust proxy`: unset or empty = none (the socket's address is the
 * client's); a whole number = that many proxies in front; otherwise a comma-separated list of
 * addresses, subnets (10.0.0.0/8) or the names loopback, linklocal and uniquelocal.
 */
export function parseTrustedProxies(value: string | undefined): false | number | string[] {
  const text = value?.trim() ?? "";
  if (!text || text === "none") return false;
  if (/^\d+$/.test(text)) return Number(text);
  return text
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
}
