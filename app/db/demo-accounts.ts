/**
 * The invented demo club's accounts, one per role. Their passwords are public on purpose: the
 * sign-in page lists them in development and in the demo (never in production), and the demo
 * data and browser tests sign in with them.
 */
import type { Role } from "~/lib/roles";

export type DemoAccount = { role: Role; name: string; email: string; password: string };

export const DEMO_CLUB_NAME = "Kestrel Valley Off-Road Club";

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { role: "director", name: "Dana Whitlock", email: "dana@kestrel.example", password: "kestrel-director" },
  { role: "marshal", name: "Marco Ferreira", email: "marco@kestrel.example", password: "kestrel-marshal" },
  { role: "driver", name: "Dee Okafor", email: "dee@kestrel.example", password: "kestrel-driver" },
];
