/** Club roles and layout statuses: shared by the database schema, the server and the browser. */
export const ROLES = ["director", "marshal", "driver"] as const;
export type Role = (typeof ROLES)[number];
export const LAYOUT_STATUSES = ["draft", "published", "archived"] as const;
export type LayoutStatus = (typeof LAYOUT_STATUSES)[number];

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
