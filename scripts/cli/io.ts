/**
 * Shared plumbing for the engine's command line: reading FILE or "-" (standard input), parsing
 * JSON, validating with zod, printing JSON, and turning bad input into a message on stderr that
 * names the field, with exit code 2 and nothing on stdout.
 */
import { readFileSync } from "node:fs";
import type { z } from "zod";

/** Input that cannot be used; `field` names the part of the input at fault. */
export class InputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
  }
}

/** One command: validates its parsed JSON input and returns JSON-ready output. */
export interface CliCommand {
  /** One line for the usage text. */
  summary: string;
  run(input: unknown): unknown;
}

/** Reads FILE, or standard input when FILE is "-". */
export function readInput(file: string): string {
  try {
    return readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (error) {
    throw new InputError(
      "FILE",
      `cannot read ${file === "-" ? "standard input" : file} (${(error as Error).message})`,
    );
  }
}

/** Parses JSON text; bad JSON is an InputError on the file. */
export function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new InputError("FILE", `not valid JSON (${(error as Error).message})`);
  }
}

/** "surface[2][0]" style path of a zod issue. */
function fieldPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const p of path) out += typeof p === "number" ? `[${p}]` : out ? `.${String(p)}` : String(p);
  return out || "input";
}

/** Validates `input` against `schema`; the first problem becomes an InputError naming its field. */
export function parseWith<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (!result.success) {
    const issue = result.error.issues[0];
    throw new InputError(fieldPath(issue.path), issue.message);
  }
  return result.data;
}

/**
 * Runs `command` on FILE and prints its JSON output. Returns the exit code: 0 on success, 2 for
 * bad input (message on stderr, nothing on stdout), 1 for anything else.
 */
export function runCommand(
  command: CliCommand,
  file: string | undefined,
  out = process.stdout,
  err = process.stderr,
): number {
  try {
    if (!file) throw new InputError("FILE", "give a JSON file, or - for standard input");
    const output = command.run(parseJson(readInput(file)));
    out.write(`${JSON.stringify(output, null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof InputError || error instanceof RangeError) {
      err.write(`loftline: bad input: ${error.message}\n`);
      return 2;
    }
    err.write(`loftline: ${(error as Error).stack ?? String(error)}\n`);
    return 1;
  }
}

const DEG = 180 / Math.PI;
/** Radians to degrees for output. */
export const toDeg = (r: number): number => r * DEG;
/** Degrees to radians for input. */
export const toRad = (d: number): number => d / DEG;
