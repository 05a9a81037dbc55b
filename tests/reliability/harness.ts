/**
 * Global set-up of the reliability tests: the whole product on loopback for the run
 * (scripts/lib/test-stack.ts), as in production, without the request log.
 */
import type { TestProject } from "vitest/node";
import { startTestStack } from "../../scripts/lib/test-stack";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
    serverPid: number;
  }
}

export default async function setup(project: TestProject) {
  const stack = await startTestStack("reliability", { LOFTLINE_REQUEST_LOG: "0" });
  project.provide("baseUrl", stack.url);
  project.provide("dataDir", stack.dataDir);
  project.provide("serverPid", stack.pid);
  return stack.stop;
}
