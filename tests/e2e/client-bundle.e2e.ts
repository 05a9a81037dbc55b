/**
 * Nothing server-only reaches the browser. Runs after the build (the e2e harness builds the app):
 * reads which source modules went into each client chunk (build/client-modules.json, written by
 * scripts/lib/client-modules-plugin.ts) and the chunks' text.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { CLIENT_MODULES_FILE } from "../../scripts/lib/client-modules-plugin";

const chunks = JSON.parse(fs.readFileSync(CLIENT_MODULES_FILE, "utf8")) as Record<string, string[]>;
const clientDir = "build/client";

function clientFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? clientFiles(full) : full.endsWith(".js") ? [full] : [];
  });
}

describe("client bundle", () => {
  it("lists the modules of every client chunk", () => {
    const modules = Object.values(chunks).flat();
    expect(Object.keys(chunks).length).toBeGreaterThan(10);
    // The editor's and the pages' own code is there, so the report is not empty or stale.
    expect(modules).toContain("app/root.tsx");
    expect(modules.some((m) => m.startsWith("app/analysis/"))).toBe(true);
  });

  it("holds no .server module, no database schema or client, and no Node-only module", () => {
    const offending = Object.entries(chunks).flatMap(([chunk, modules]) =>
      modules
        .filter(
          (m) =>
            /\.server\.(ts|tsx|js)$/.test(m) ||
            m.startsWith("app/db/schema") ||
            m.startsWith("app/db/client") ||
            m.includes("node_modules/drizzle-orm") ||
            m.includes("node_modules/@libsql") ||
            m.includes("node_modules/bcryptjs") ||
            m.includes("node_modules/nodemailer"),
        )
        .map((m) => `${chunk}: ${m}`),
    );
    expect(offending).toEqual([]);
  });

  it("contains neither the word drizzle nor the password column in any chunk's text", () => {
    const files = clientFiles(clientDir);
    expect(files.length).toBeGreaterThan(10);
    const hits = files.filter((file) => /drizzle|password_hash/i.test(fs.readFileSync(file, "utf8")));
    expect(hits).toEqual([]);
  });
});
