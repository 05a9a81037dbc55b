import { createHash, randomBytes } from "node:crypto";

/** A new link token: 32 random bytes as base64url (43 characters), and the SHA-256 we store. */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashLinkToken(token) };
}

/** SHA-256 of a link token, hex. Only this is stored: a copy of the database opens no door. */
export function hashLinkToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** A token in the shape newLinkToken makes; anything else is not looked up at all. */
export function looksLikeLinkToken(token: string | undefined): token is string {
  return typeof token === "string" && /^[A-Za-z0-9_-]{43}$/.test(token);
}
