import type { LayoutStatus, Role } from "~/db/schema";

export const ROLE_LABELS: Record<Role, string> = {
  director: "Race director",
  marshal: "Marshal",
  driver: "Driver",
};

/** What a role may do in its club. Pure so both sides and the tests can use it. */
export function roleAllows(role: Role, action: "manage" | "read"): boolean {
  if (action === "read") return true;
  return role === "director";
}

/** Directors see every layout; marshals and drivers only published ones. */
export function canSeeLayout(role: Role, status: LayoutStatus): boolean {
  return role === "director" || status === "published";
}
