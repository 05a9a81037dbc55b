import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vite";
import { clientModulesReport } from "./scripts/lib/client-modules-plugin.ts";

export default defineConfig({
  plugins: [tailwindcss(), reactRouter(), clientModulesReport()],
  resolve: { tsconfigPaths: true },
});
