import { randomBytes } from "node:crypto";
import { LRUCache } from "lru-cache";
import { createCookie, createSessionStorage, redirect, type Cookie } from "react-router";
import { and, eq, gt, lt } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { sessions, users } from "~/db/schema";
import { config } from "~/lib/config.server";

const DEV_SECRET = "loftline-development-secret-change-me";

function sessionSecret(): string {
  const secret = process.env.SESSION_SECRET;
  if (secret) return secret;
  if (config.isProduction && process.env.LOFTLINE_DEMO !== "1") {
    throw new Error("SESSION_SECRET must be set in production.");
  }
  console.warn(
    "[loftline] SESSION_SECRET is not set: using the development default. Never do this in production.",
  );
  return DEV_SECRET;
}

/** `sessionVersion` is the user's value when the session began; a password reset raises it. */
type SessionData = { userId: string; sessionVersion: number };
type SessionFlash = { notice: string };

/** How long a session lasts without signing in again, s (30 days). */
export const SESSION_MAX_AGE_S = 60 * 60 * 24 * 30;

/**
 * The cookie with its signature check remembered per cookie header (only the check: the session's
 * row is read on every request, so signing out still ends every copy of the cookie at once). A
 * check costs a key import and an HMAC; a page asks several times (docs/decisions/0459).
 */
function checkedOnce(cookie: Cookie): Cookie {
  const checked = new LRUCache<string, { value: unknown }>({ max: 5000 });
  return {
    get name() {
      return cookie.name;
    },
    get isSigned() {
      return cookie.isSigned;
    },
    get expires() {
      return cookie.expires;
    },
    async parse(header, options) {
      if (!header || options) return cookie.parse(header, options);
      const known = checked.get(header);
      if (known) return known.value;
      const value: unknown = await cookie.parse(header);
      if (typeof value === "string" || value === null) checked.set(header, { value });
      return value;
    },
    serialize: (value, options) => cookie.serialize(value, options),
  };
}

let storage: ReturnType<typeof createSessionStorage<SessionData, SessionFlash>> | undefined;

/**
 * Sessions kept in the database (`sessions`), the signed cookie holding only a random id:
 * httpOnly, SameSite=Lax, Secure in production. Signing out deletes the row, so a copied cookie
 * stops working (docs/decisions/0314-server-side-sessions.md).
 */
export function sessionStorage() {
  storage ??= createSessionStorage<SessionData, SessionFlash>({
    cookie: checkedOnce(
      createCookie("__loftline", {
        httpOnly: true,
        sameSite: "lax",
        path: "/",
        secure: config.isProduction && process.env.LOFTLINE_INSECURE_COOKIE !== "1",
        secrets: [sessionSecret()],
        maxAge: SESSION_MAX_AGE_S,
      }),
    ),
    async createData(data, expires) {
      const db = await getDb();
      const now = Date.now();
      // Rows past their time are of no use: each new session clears them away.
      await db.delete(sessions).where(lt(sessions.expiresAt, new Date(now)));
      const id = randomBytes(32).toString("base64url");
      await db.insert(sessions).values({
        id,
        userId: data.userId ?? null,
        data: JSON.stringify(data),
        expiresAt: expires ?? new Date(now + SESSION_MAX_AGE_S * 1000),
      });
      return id;
    },
    async readData(id) {
      const db = await getDb();
      const [row] = await db
        .select({ data: sessions.data })
        .from(sessions)
        .where(and(eq(sessions.id, id), gt(sessions.expiresAt, new Date())));
      return row ? JSON.parse(row.data) : null;
    },
    async updateData(id, data, expires) {
      const db = await getDb();
      // Only a session that still exists: one signed out meanwhile stays signed out.
      await db
        .update(sessions)
        .set({ data: JSON.stringify(data), ...(expires ? { expiresAt: expires } : {}) })
        .where(eq(sessions.id, id));
    },
    async deleteData(id) {
      const db = await getDb();
      await db.delete(sessions).where(eq(sessions.id, id));
    },
  });
  return storage;
}

const sessionsOfRequests = new WeakMap<Request, ReturnType<typeof readSession>>();

const readSession = (request: Request) => sessionStorage().getSession(request.headers.get("Cookie"));

/**
 * The request's session. A GET request's loaders (the root, the frame, the page) share one read
 * of it; any other request reads it afresh.
 */
export async function getSession(request: Request) {
  if (request.method !== "GET") return readSession(request);
  let session = sessionsOfRequests.get(request);
  if (!session) {
    session = readSession(request);
    sessionsOfRequests.set(request, session);
  }
  return session;
}

/**
 * Starts a session for the user and redirects, with an optional flash notice. Always a new
 * session id: a session the browser had before (perhaps one planted on it) is ended.
 */
export async function createUserSession(
  request: Request,
  userId: string,
  redirectTo: string,
  notice?: string,
) {
  const previous = await getSession(request);
  if (previous.id) await sessionStorage().destroySession(previous);
  const session = await sessionStorage().getSession();
  const db = await getDb();
  const [user] = await db
    .select({ sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(users.id, userId));
  session.set("userId", userId);
  session.set("sessionVersion", user?.sessionVersion ?? 0);
  if (notice) session.flash("notice", notice);
  throw redirect(safeRedirect(redirectTo), {
    headers: { "Set-Cookie": await sessionStorage().commitSession(session) },
  });
}

/** Signs out: the session's row is deleted (every copy of the cookie stops working) and the cookie cleared. */
export async function destroyUserSession(request: Request, redirectTo = "/") {
  const session = await getSession(request);
  throw redirect(redirectTo, {
    headers: { "Set-Cookie": await sessionStorage().destroySession(session) },
  });
}

/** A redirect with a one-time notice shown on the next page. */
export async function redirectWithNotice(request: Request, to: string, notice: string) {
  const session = await getSession(request);
  session.flash("notice", notice);
  return redirect(to, { headers: { "Set-Cookie": await sessionStorage().commitSession(session) } });
}

/**
 * Only paths on the app's own origin: an open redirect would let a link send users anywhere. The
 * target is read the way a browser reads a Location (backslashes as slashes, tabs and newlines
 * dropped) against the app's origin, must stay on that origin, and comes back as a clean path.
 */
export function safeRedirect(to: FormDataEntryValue | string | null | undefined, fallback = "/clubs") {
  if (typeof to !== "string" || !to.startsWith("/")) return fallback;
  const own = new URL(config.appUrl);
  let url: URL;
  try {
    url = new URL(to, own);
  } catch {
    return fallback;
  }
  if (url.origin !== own.origin) return fallback;
  const path = url.pathname + url.search + url.hash;
  // "/..//host" resolves to the path "//host", which a browser would read as another site.
  return path.startsWith("//") ? fallback : path;
}
