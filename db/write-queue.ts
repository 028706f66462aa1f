import { AsyncLocalStorage } from 'node:async_hooks';
import type { Sequelize } from 'sequelize';

// SQLite has one writer. Each Sequelize transaction holds its own connection, and a connection waiting
// on the lock blocks one of libuv's few worker threads; enough waiters starve the holder and the whole
// server stalls. So managed write transactions of this process run one at a time, queued in JS, and only
// this queue ever waits. A transaction started inside another (without passing it) runs at once rather
// than queueing behind itself; SQLite's busy timeout then reports the mistake instead of a hang.
export function queueTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  const inside = new AsyncLocalStorage<true>();
  let tail: Promise<unknown> = Promise.resolve();
  const queued = (...args: unknown[]): Promise<unknown> => {
    // Unmanaged transactions (no callback) are committed by hand later; they cannot take part in the queue.
    if (typeof args[args.length - 1] !== 'function' || inside.getStore()) return original(...args);
    const run = tail.then(() => inside.run(true, () => original(...args)));
    tail = run.catch(() => undefined);
    return run;
  };
  (sequelize as unknown as { transaction: typeof queued }).transaction = queued;
}
