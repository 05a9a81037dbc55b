/**
 * Sign-in with an e-mail address and password: remix-auth's Authenticator with the form strategy
 * checks the password; this module adds the form parsing and the failed-attempt throttle around
 * it. The session is kept by session.server (createUserSession), not by remix-auth.
 */
import { Authenticator } from "remix-auth";
import { FormStrategy } from "remix-auth-form";
import { parseForm, type FieldErrors } from "~/lib/forms";
import { signInSchema } from "~/lib/schemas/auth";
import type { SessionUser } from "./permissions.server";
import { purgeFailures, releaseAttempt, reserveAttempt, throttleMessage } from "./throttle.server";
import { verifyLogin } from "./users.server";

/** Thrown by the strategy when the address and password do not match an account. */
export class InvalidCredentialsError extends Error {
  constructor() {
    super("The e-mail address or password is not right.");
    this.name = "InvalidCredentialsError";
  }
}

/** The one message for a wrong password and for an address without an account. */
export const INVALID_CREDENTIALS_MESSAGE =
  "That e-mail address and password do not match an account. Check them, or reset your password.";

export const authenticator = new Authenticator<SessionUser>();

authenticator.use(
  new FormStrategy(async ({ form }) => {
    const parsed = parseForm(signInSchema, form);
    if (!parsed.ok) throw new InvalidCredentialsError();
    const user = await verifyLogin(parsed.data.email, parsed.data.password);
    if (!user) throw new InvalidCredentialsError();
    return user;
  }),
  "password",
);

export type SignInResult =
  | { kind: "ok"; user: SessionUser; redirectTo: string | undefined }
  | { kind: "invalid"; errors: FieldErrors; email: string }
  | { kind: "refused"; message: string; email: string }
  | { kind: "throttled"; message: string; retryAfterSeconds: number; email: string };

/**
 * Runs one sign-in attempt from a submitted form: field checks (400), the throttle (429), then
 * the password check through the authenticator. Only a wrong password counts as a failure: the
 * attempt is counted before the check and given back when the password is right, so parallel
 * guesses cannot pass the limit. `clientAddress` comes from the server (the load context).
 */
export async function signInWithPassword(
  request: Request,
  clientAddress: string | null,
): Promise<SignInResult> {
  const form = await request.clone().formData();
  const parsed = parseForm(signInSchema, form);
  const typedEmail = String(form.get("email") ?? "").slice(0, 254);
  if (!parsed.ok) return { kind: "invalid", errors: parsed.errors, email: typedEmail };

  const key = { email: parsed.data.email, clientAddress };
  const gate = await reserveAttempt(key);
  if (!gate.allowed) {
    return {
      kind: "throttled",
      message: throttleMessage(gate.retryAfterSeconds),
      retryAfterSeconds: gate.retryAfterSeconds,
      email: parsed.data.email,
    };
  }
  let user: SessionUser;
  try {
    user = await authenticator.authenticate("password", request);
  } catch (err) {
    if (!(err instanceof InvalidCredentialsError)) {
      await releaseAttempt(gate.attemptId); // the server's fault, not a wrong password
      throw err;
    }
    await purgeFailures();
    return { kind: "refused", message: INVALID_CREDENTIALS_MESSAGE, email: parsed.data.email };
  }
  await releaseAttempt(gate.attemptId);
  return { kind: "ok", user, redirectTo: parsed.data.redirectTo };
}
