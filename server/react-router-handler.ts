/**
 * The framework's request handler behind the server's own checks: the route's body rule, the
 * Origin check, and the load context (client address, CSP nonce). Same job as
 * @react-router/express's handler, but the body the app reads is the one prepared here (counted,
 * checked), and an answer the server already gave (413 mid-stream) is never overwritten.
 */
import type { IncomingMessage, ServerResponse } from "node:http";
import { writeReadableStreamToWritable } from "@react-router/node";
import type { NextFunction, Request as ExpressRequest, Response as ExpressResponse } from "express";
import { createRequestHandler, type ServerBuild } from "react-router";
import { refuse, sendWhole, type AnswerForm } from "./answers";
import { bodyRuleFor } from "./body-rules";
import { clientAddress, type ClientAddressOptions } from "./client-address";
import { CROSS_SITE_MESSAGE, originAllowed, requestOrigin } from "./origin-check";
import { hasBody, isRefusal, prepareBody, tooLargeMessage, type PreparedBody } from "./request-body";
import { isDataRequest, routeMatcher } from "./routes";
import { TOKEN_ROUTES } from "./security-headers";

export type HandlerOptions = {
  build: ServerBuild;
  mode: string;
  /** APP_URL's origin: requests from it pass the Origin check. */
  appOrigin: string;
  clientAddress: ClientAddressOptions;
};

export function reactRouterHandler(opts: HandlerOptions) {
  const handle = createRequestHandler(opts.build, opts.mode);
  const matchRoute = routeMatcher(opts.build);
  return async (req: ExpressRequest, res: ExpressResponse, next: NextFunction) => {
    try {
      if (!req.originalUrl.startsWith("/")) {
        return refuse(req, res, "text", 400, "The request's address must be a path.");
      }
      const route = matchRoute(req.path);
      const form: AnswerForm = !route || route.resource ? "json" : isDataRequest(req.path) ? "text" : "html";
      if (route && TOKEN_ROUTES.has(route.id)) res.setHeader("Referrer-Policy", "no-referrer");
      if (!originAllowed(req, opts.appOrigin)) return refuse(req, res, form, 403, CROSS_SITE_MESSAGE);

      const controller = new AbortController();
      res.once("close", () => {
        if (!res.writableFinished) controller.abort();
      });
      let prepared: PreparedBody = { body: null };
      if (req.method !== "GET" && req.method !== "HEAD") {
        const rule = bodyRuleFor(route?.id);
        const result = await prepareBody(req, rule, {
          // A client that sent "Expect: 100-continue" sends the body only after this; one whose
          // body is refused (too large, wrong type) gets the refusal without sending it.
          beforeRead: () => {
            if (/100-continue/i.test(req.headers.expect ?? "")) res.writeContinue();
          },
          onTooLarge: () => {
            // A streamed body passed the limit while the route read it: answer now, stop the route.
            refuse(req, res, form, 413, tooLargeMessage(rule.maxBytes));
            controller.abort();
          },
        });
        if (isRefusal(result)) return refuse(req, res, form, result.status, result.message);
        prepared = result;
      }

      let request: Request;
      try {
        request = fetchRequest(req, prepared, controller.signal);
      } catch {
        return refuse(req, res, form, 400, "The request's address or headers could not be read.");
      }
      const response = await handle(request, {
        clientAddress: clientAddress(req, opts.clientAddress),
        cspNonce: res.locals.cspNonce as string,
      });
      await sendResponse(req, res, response);
    } catch (error) {
      next(error);
    }
  };
}

/** The web Request the framework reads: this address, the headers, the prepared body. */
function fetchRequest(req: ExpressRequest, prepared: PreparedBody, signal: AbortSignal): Request {
  const headers = new Headers();
  for (const [key, value] of Object.entries(req.headers)) {
    // The Origin check above is the one that counts (it also accepts APP_URL and the token
    // pages' "null"); the framework's own narrower check must not refuse what it let through.
    if (value === undefined || key === "origin") continue;
    for (const v of Array.isArray(value) ? value : [value]) headers.append(key, v);
  }
  if (prepared.contentType) headers.set("content-type", prepared.contentType);
  const init: RequestInit & { duplex?: "half" } = { method: req.method, headers, signal };
  if (prepared.body instanceof Uint8Array) {
    headers.delete("transfer-encoding");
    headers.set("content-length", String(prepared.body.byteLength));
    init.body = prepared.body as Uint8Array<ArrayBuffer>;
  } else if (prepared.body) {
    init.body = prepared.body;
    init.duplex = "half";
  }
  return new Request(requestOrigin(req) + req.originalUrl, init);
}

async function sendResponse(req: IncomingMessage, res: ServerResponse, response: Response): Promise<void> {
  if (res.headersSent || res.writableEnded || res.destroyed) {
    await response.body?.cancel().catch(() => {});
    return;
  }
  res.statusCode = response.status;
  if (response.statusText && /^[\t\x20-\x7e]*$/.test(response.statusText)) {
    res.statusMessage = response.statusText;
  }
  // The app's own headers win over the server's defaults (e.g. a page's Referrer-Policy).
  for (const [key, value] of response.headers) if (key !== "set-cookie") res.setHeader(key, value);
  const cookies = response.headers.getSetCookie();
  if (cookies.length) res.setHeader("Set-Cookie", cookies);
  if (hasBody(req) && !req.complete) {
    // The route answered without reading all of the body (a refused upload, 401 before it): a
    // short answer, sent whole while the rest of the body is dropped.
    sendWhole(req, res, new Uint8Array(await response.arrayBuffer()));
    return;
  }
  if (!response.body) {
    res.end();
    return;
  }
  try {
    await writeReadableStreamToWritable(response.body, res);
  } catch (error) {
    if (!res.destroyed && !res.writableEnded) throw error;
  }
}
