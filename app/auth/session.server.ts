import { createCookieSessionStorage, redirect } from "react-router";
import { eq } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { users } from "~/db/schema";
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

let storage: ReturnType<typeof createCookieSessionStorage<SessionData, SessionFlash>> | undefined;

/** Signed, stateless cookie sessions: httpOnly, SameSite=Lax, Secure in production. */
export function sessionStorage() {
  storage ??= createCookieSessionStorage<SessionData, SessionFlash>({
    cookie: {
      name: "__loftline",
      httpOnly: true,
      sameSite: "lax",
      path: "/",
      secure: config.isProduction && process.env.LOFTLINE_INSECURE_COOKIE !== "1",
      secrets: [sessionSecret()],
      maxAge: 60 * 60 * 24 * 30,
    },
  });
  return storage;
}

export async function getSession(request: Request) {
  return sessionStorage().getSession(request.headers.get("Cookie"));
}

/** Starts a session for the user and redirects, with an optional flash notice. */
export async function createUserSession(
  request: Request,
  userId: string,
  redirectTo: string,
  notice?: string,
) {
  const session = await getSession(request);
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

/** Only same-site paths: an open redirect would let a link send users anywhere. */
export function safeRedirect(to: FormDataEntryValue | string | null | undefined, fallback = "/clubs") {
  if (typeof to !== "string" || !to.startsWith("/") || to.startsWith("//")) return fallback;
  return to;
}
