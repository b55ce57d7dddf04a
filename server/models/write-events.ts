import type { Transaction } from 'sequelize';

/**
 * Work to run after a write to a programme's recipes, observations or calibrations has committed
 * in this process (dropping that programme's cached map overlay). Listeners must be quick and
 * must not throw.
 */
const listeners = new Set<(programmeId: number) => void>();

export function onProgrammeWritten(listener: (programmeId: number) => void) {
  listeners.add(listener);
}

const pending = new WeakMap<Transaction, Set<number>>();

function notify(programmeId: number) {
  for (const listener of listeners) listener(programmeId);
}

/**
 * Records that `programmeId` was written in `transaction`; listeners hear of it once, after the
 * commit (at once when there is no transaction). A rolled-back write tells nobody.
 */
export function programmeWritten(programmeId: number, transaction: Transaction | null | undefined) {
  if (!transaction) return notify(programmeId);
  let ids = pending.get(transaction);
  if (!ids) {
    const fresh = new Set<number>();
    pending.set(transaction, fresh);
    transaction.afterCommit(() => {
      for (const id of fresh) notify(id);
    });
    ids = fresh;
  }
  ids.add(programmeId);
}
