/**
 * A Vite plugin that records, for the browser build only, which source modules went into which
 * chunk: build/client-modules.json (outside build/client, so it is never served). The client-bundle
 * test reads it to prove that no server module, database schema or secret reaches the browser.
 */
import fs from "node:fs";
import path from "node:path";
import type { Plugin } from "vite";

export const CLIENT_MODULES_FILE = "build/client-modules.json";

export function clientModulesReport(): Plugin {
  return {
    name: "loftline-client-modules-report",
    apply: "build",
    generateBundle(_options, bundle) {
      if (this.environment?.name !== "client") return;
      const root = process.cwd();
      const chunks: Record<string, string[]> = {};
      for (const [fileName, output] of Object.entries(bundle)) {
        if (output.type !== "chunk") continue;
        chunks[fileName] = Object.keys(output.modules).map((id) =>
          path.relative(root, id.replace(/^\0/, "")).split(path.sep).join("/"),
        );
      }
      fs.mkdirSync(path.dirname(CLIENT_MODULES_FILE), { recursive: true });
      fs.writeFileSync(CLIENT_MODULES_FILE, JSON.stringify(chunks, null, 1));
    },
  };
}
