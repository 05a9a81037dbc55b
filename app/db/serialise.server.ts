import type { Client, Transaction } from "@libsql/client";

/**
 * Serialises every use of a local-file libSQL client within this process.
 *
 * The file driver is synchronous: a statement that waits for SQLite's write lock blocks the whole
 * Node process for the busy timeout, so the transaction holding the lock (which needs the event
 * loop to reach its COMMIT) cannot finish, and the waiter fails with SQLITE_BUSY. Queueing
 * statements and whole transactions behind one another removes that stall; it costs nothing,
 * since the driver runs one statement at a time anyway. Inside `db.transaction(async (tx) => …)`
 * use only `tx`: a query on `db` there would wait for the transaction it is part of.
 * (docs/decisions/0010-serialised-local-database.md)
 */
export function serialiseClient(client: Client): Client {
  let tail: Promise<void> = Promise.resolve();

  /** Resolves when every earlier holder has released; returns this holder's release. */
  function acquire(): Promise<() => void> {
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const previous = tail;
    tail = previous.then(() => held);
    return previous.then(() => release);
  }

  async function queued<T>(work: () => Promise<T>): Promise<T> {
    const release = await acquire();
    try {
      return await work();
    } finally {
      release();
    }
  }

  async function transaction(...args: Parameters<Client["transaction"]>): Promise<Transaction> {
    const release = await acquire();
    let tx: Transaction;
    try {
      tx = await client.transaction(...args);
    } catch (err) {
      release();
      throw err;
    }
    let released = false;
    const done = () => {
      if (!released) {
        released = true;
        release();
      }
    };
    const commit = tx.commit.bind(tx);
    const rollback = tx.rollback.bind(tx);
    const close = tx.close.bind(tx);
    tx.commit = () => commit().finally(done);
    tx.rollback = () => rollback().finally(done);
    tx.close = () => {
      close();
      done();
    };
    return tx;
  }

  return new Proxy(client, {
    get(target, prop, receiver) {
      if (prop === "transaction") return transaction;
      if (prop === "execute" || prop === "batch" || prop === "migrate" || prop === "executeMultiple") {
        const method = Reflect.get(target, prop, receiver) as (...a: unknown[]) => Promise<unknown>;
        return (...a: unknown[]) => queued(() => method.apply(target, a));
      }
      const value = Reflect.get(target, prop, receiver);
      return typeof value === "function" ? value.bind(target) : value;
    },
  });
}
