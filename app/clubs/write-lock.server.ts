/**
 * One writer at a time within this process.
 *
 * libSQL runs statements synchronously on the main thread. When one request holds a write
 * transaction open across an `await` and another request writes meanwhile, the second write waits
 * out the busy timeout (5 s) with the event loop blocked, so the first can never finish, and then
 * fails with SQLITE_BUSY. Queuing this module's writes behind each other avoids that. Several
 * processes sharing one file are unaffected: there the other process holds the lock and finishes.
 * (docs/decisions/0355-one-writer-per-process.md)
 */
let tail: Promise<unknown> = Promise.resolve();

/** Runs `write` after every write queued before it has settled. Never call it from inside `write`. */
export function serialWrite<T>(write: () => Promise<T>): Promise<T> {
  const next = tail.then(write, write);
  tail = next.catch(() => undefined);
  return next;
}
