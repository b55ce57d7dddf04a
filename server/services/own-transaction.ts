import type { Transaction } from 'sequelize';
import type { HandlerContext } from '../http/route';

/**
 * Runs `work` in a transaction of its own that stands in as the route's while it runs
 * (`ctx.transaction`, so `ctx.audit` writes in it). For routes declared `transactional: false`
 * because they first wait on a heavy-job worker: holding a transaction (and its connection)
 * through seconds of computation would tie up the pool and outlast the socket timeout.
 */
export async function inOwnTransaction<T>(ctx: HandlerContext<unknown, unknown, unknown>, work: (transaction: Transaction) => Promise<T>): Promise<T> {
  return ctx.deps.sequelize.transaction(async (transaction) => {
    ctx.transaction = transaction;
    try {
      return await work(transaction);
    } finally {
      ctx.transaction = null;
    }
  });
}
