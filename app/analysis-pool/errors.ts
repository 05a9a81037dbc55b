/**
 * Why the analysis pool refused a task. Plain classes both the pool and the answers import.
 */
import type { LayoutIssue } from "~/analysis";

/** Over the work budget, the time limit or the memory limit of one analysis: answered 422. */
export class AnalysisBudgetError extends Error {
  constructor(
    /** Each names the document's field (without a "document." prefix) and the limit. */
    readonly issues: LayoutIssue[],
    readonly limit: "work" | "time" | "memory",
  ) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join("; "));
    this.name = "AnalysisBudgetError";
  }
}

/**
 * No room now: the server's queue is full (answered 503) or the account already has its most
 * analyses queued or running (answered 429). Either way, try again after `retryAfterS` seconds.
 */
export class AnalysisBusyError extends Error {
  constructor(
    readonly scope: "server" | "account",
    readonly retryAfterS: number,
    readonly perAccount = 0,
  ) {
    super(
      scope === "server"
        ? `The server has as many analyses waiting as it takes; try again in ${retryAfterS} s.`
        : `You already have ${perAccount} analyses running, the most one account may have at once; try again when one has finished.`,
    );
    this.name = "AnalysisBusyError";
  }
}
