/**
 * The framework's default server entry, plus the Content-Security-Policy nonce: every inline
 * script React and the router write (the hydration data, scroll restoration, streamed parts)
 * carries this response's nonce from the load context, and <Scripts> gets it through NonceContext.
 * Routes that opt in with `handle = { htmlCache: true }` (the reader pages) are rendered whole
 * once per set of data and then answered from app/lib/html-cache.server.ts, each answer with its
 * own nonce (docs/decisions/0459-reader-page-speed.md).
 */
import { PassThrough, Writable } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { isbot } from "isbot";
import type { RenderToPipeableStreamOptions } from "react-dom/server";
import { renderToPipeableStream } from "react-dom/server";
import type { AppLoadContext, EntryContext, HandleErrorFunction } from "react-router";
import { isRouteErrorResponse, ServerRouter } from "react-router";
import { NonceContext } from "~/lib/nonce";
import { keepPage, NONCE_SLOT, pageKey, pageResponse, recallPage } from "~/lib/html-cache.server";

export const streamTimeout = 5_000;

export default function handleRequest(
  request: Request,
  responseStatusCode: number,
  responseHeaders: Headers,
  routerContext: EntryContext,
  loadContext: AppLoadContext,
) {
  if (request.method.toUpperCase() === "HEAD") {
    return new Response(null, { status: responseStatusCode, headers: responseHeaders });
  }
  const nonce = loadContext?.cspNonce;
  const key = nonce ? cacheKey(request, responseStatusCode, routerContext) : null;
  if (nonce && key)
    return cachedPage(request, key, nonce, responseStatusCode, responseHeaders, routerContext);

  return new Promise<Response>((resolve, reject) => {
    let shellRendered = false;
    const userAgent = request.headers.get("user-agent");
    // Bots wait for all content; people get the shell as soon as it is ready.
    const readyOption: keyof RenderToPipeableStreamOptions =
      (userAgent && isbot(userAgent)) || routerContext.isSpaMode ? "onAllReady" : "onShellReady";
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(
      () => abort(),
      streamTimeout + 1000,
    );

    const { pipe, abort } = renderToPipeableStream(
      <NonceContext.Provider value={nonce}>
        <ServerRouter context={routerContext} url={request.url} nonce={nonce} />
      </NonceContext.Provider>,
      {
        nonce,
        [readyOption]() {
          shellRendered = true;
          const body = new PassThrough({
            final(callback) {
              clearTimeout(timeoutId);
              timeoutId = undefined;
              callback();
            },
          });
          const stream = createReadableStreamFromReadable(body);
          responseHeaders.set("Content-Type", "text/html");
          pipe(body);
          resolve(new Response(stream, { headers: responseHeaders, status: responseStatusCode }));
        },
        onShellError(error: unknown) {
          reject(error);
        },
        onError(error: unknown) {
          responseStatusCode = 500;
          if (shellRendered) console.error(error);
        },
      },
    );
  });
}

/** The key of a page whose route opted in, or null (errors, SPA mode, other methods, other routes). */
function cacheKey(request: Request, status: number, context: EntryContext): string | null {
  const { matches, loaderData, actionData, errors } = context.staticHandlerContext;
  const leaf = matches[matches.length - 1];
  const handle = leaf
    ? (context.routeModules[leaf.route.id]?.handle as { htmlCache?: boolean } | undefined)
    : undefined;
  if (!handle?.htmlCache || errors || actionData || context.isSpaMode || request.method !== "GET")
    return null;
  const url = new URL(request.url);
  return pageKey({ build: context.manifest.version, url: url.pathname + url.search, status, loaderData });
}

async function cachedPage(
  request: Request,
  key: string,
  nonce: string,
  status: number,
  headers: Headers,
  context: EntryContext,
): Promise<Response> {
  const known = recallPage(key);
  if (known) return pageResponse(request, known, nonce, status, headers);
  const { html, failed } = await renderWhole(request, context);
  if (failed) {
    // Not kept; its placeholder nonce is replaced all the same.
    headers.set("Content-Type", "text/html");
    return new Response(html.toString("utf8").split(NONCE_SLOT).join(nonce), { status: 500, headers });
  }
  return pageResponse(request, keepPage(key, html), nonce, status, headers);
}

/** The whole page at once (every Suspense boundary resolved), with the placeholder nonce. */
function renderWhole(request: Request, context: EntryContext): Promise<{ html: Buffer; failed: boolean }> {
  return new Promise((resolve, reject) => {
    let failed = false;
    const chunks: Buffer[] = [];
    const sink = new Writable({
      write(chunk: Buffer, _encoding, callback) {
        chunks.push(chunk);
        callback();
      },
      final(callback) {
        clearTimeout(timeoutId);
        resolve({ html: Buffer.concat(chunks), failed });
        callback();
      },
    });
    const timeoutId = setTimeout(() => abort(), streamTimeout + 1000);
    const { pipe, abort } = renderToPipeableStream(
      <NonceContext.Provider value={NONCE_SLOT}>
        <ServerRouter context={context} url={request.url} nonce={NONCE_SLOT} />
      </NonceContext.Provider>,
      {
        nonce: NONCE_SLOT,
        onAllReady() {
          pipe(sink);
        },
        onShellError(error: unknown) {
          clearTimeout(timeoutId);
          reject(error);
        },
        onError(error: unknown) {
          failed = true;
          console.error(error);
        },
      },
    );
  });
}

/**
 * Errors are logged, except the router's own 4xx answers (e.g. 405 for a POST to a page without
 * a form) and those of requests the client or the server already gave up on.
 */
export const handleError: HandleErrorFunction = (error, { request }) => {
  if (request.signal.aborted || (isRouteErrorResponse(error) && error.status < 500)) return;
  console.error(error);
};
