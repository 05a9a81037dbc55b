import { data } from "react-router";
import type { FieldErrors } from "~/lib/forms";

/**
 * A refusal by a club or layout rule (last director, duplicate invitation, stale version, ...).
 * Thrown inside a transaction it rolls every write back; the route turns it into a message with
 * its status beside the form (or on the field named by `field`).
 */
export class RuleError extends Error {
  readonly status: number;
  readonly field: string | undefined;

  constructor(status: number, message: string, field?: string) {
    super(message);
    this.name = "RuleError";
    this.status = status;
    this.field = field;
  }
}

export function isRuleError(error: unknown): error is RuleError {
  return error instanceof RuleError;
}

/**
 * The answer to a refused form: the message beside its field (or the form) with the rule's
 * status. Anything that is not a RuleError is thrown on, to the error page.
 */
export function refusal<V extends Record<string, string | string[]>>(error: unknown, values: V = {} as V) {
  if (!isRuleError(error)) throw error;
  const errors: FieldErrors = { [error.field ?? "form"]: [error.message] };
  return data({ errors, values }, { status: error.status });
}
