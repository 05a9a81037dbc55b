/**
 * Global set-up of the browser tests: the whole product on loopback for the run (scripts/lib/test-stack.ts),
 * with the same environment as `npm run demo`.
 */
import type { TestProject } from "vitest/node";
import { startTestStack } from "../../scripts/lib/test-stack";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
  }
}

export default async function setup(project: TestProject) {
  const stack = await startTestStack("e2e", { LOFTLINE_DEMO: "1" });
  project.provide("baseUrl", stack.url);
  project.provide("dataDir", stack.dataDir);
  return stack.stop;
}
