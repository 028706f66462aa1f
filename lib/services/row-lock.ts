import type { Model, ModelStatic, Transaction } from 'sequelize';

/**
 * Options for a read whose answer decides a write in the same transaction (a version check, a status, a count).
 * On PostgreSQL at READ COMMITTED this is SELECT … FOR UPDATE: a second writer waits, then reads the first one's result.
 * SQLite ignores the lock; its write transactions (BEGIN IMMEDIATE) already run one at a time.
 * `of` names the table to lock when the read joins others (PostgreSQL refuses to lock the nullable side of a join).
 */
export function forUpdate(transaction: Transaction, of?: ModelStatic<Model>) {
  return { transaction, lock: of ? { level: transaction.LOCK.UPDATE, of } : transaction.LOCK.UPDATE };
}
