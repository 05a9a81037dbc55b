import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import { getDb, type Database } from "~/db/client.server";
import { users } from "~/db/schema";

const BCRYPT_COST = 10;

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export async function findUserByEmail(email: string, db?: Database) {
  db ??= await getDb();
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, normaliseEmail(email)));
  return user;
}

/** Creates a user; returns null when the e-mail address is already taken. */
export async function createUser(
  input: { email: string; name: string; password: string },
  db?: Database,
): Promise<{ id: string; email: string; name: string } | null> {
  db ??= await getDb();
  const passwordHash = await hashPassword(input.password);
  const rows = await db
    .insert(users)
    .values({ email: normaliseEmail(input.email), name: input.name.trim(), passwordHash })
    .onConflictDoNothing({ target: users.email })
    .returning({ id: users.id, email: users.email, name: users.name });
  return rows[0] ?? null;
}

/** The user when the password matches; null otherwise (same timing whether or not the account exists). */
export async function verifyLogin(email: string, password: string) {
  const user = await findUserByEmail(email);
  // Compare against a fixed hash when there is no account, so timing does not reveal it.
  const hash = user?.passwordHash ?? "$2b$10$CwTycUXWue0Thq9StjUM0uJ8.X8w8p2vRrY6ZlH1lLQq4h6yQ5e5e";
  const ok = await bcrypt.compare(password, hash);
  if (!user || !ok) return null;
  return { id: user.id, email: user.email, name: user.name };
}
