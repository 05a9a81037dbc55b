/**
 * Undo and redo: a bounded list of past states, the present and the undone future. Pure: every
 * operation returns a new history and keeps the states it holds by reference (no copies).
 */

/** How many steps back the editor keeps (the issue asks for at least 50). */
export const HISTORY_LIMIT = 100;

export interface History<T> {
  past: readonly T[];
  present: T;
  future: readonly T[];
}

export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

/** Makes `next` the present as a new step (the old present becomes undoable; redo is cleared). */
export function record<T>(h: History<T>, next: T, limit = HISTORY_LIMIT): History<T> {
  if (next === h.present) return h;
  const past = h.past.length >= limit ? h.past.slice(h.past.length - limit + 1) : h.past.slice();
  past.push(h.present);
  return { past, present: next, future: [] };
}

/** Replaces the present without a new step: the later moves of one drag amend its first step. */
export function amend<T>(h: History<T>, next: T): History<T> {
  if (next === h.present) return h;
  return { past: h.past, present: next, future: [] };
}

export function canUndo<T>(h: History<T>): boolean {
  return h.past.length > 0;
}

export function canRedo<T>(h: History<T>): boolean {
  return h.future.length > 0;
}

/** One step back; unchanged when there is nothing to undo. */
export function undo<T>(h: History<T>): History<T> {
  if (h.past.length === 0) return h;
  const past = h.past.slice(0, -1);
  return { past, present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
}

/** One step forward again; unchanged when there is nothing to redo. */
export function redo<T>(h: History<T>): History<T> {
  if (h.future.length === 0) return h;
  const [next, ...future] = h.future;
  return { past: [...h.past, h.present], present: next, future };
}
