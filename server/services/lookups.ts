import type { Transaction } from 'sequelize';
import { badRequest, notFound } from '../errors';
import { Programme } from '../models';

/** The programme, or a 404 (as a route parameter) / 400 naming the field (as a body field). */
export async function requireProgramme(id: number, transaction: Transaction | null, as: 'param' | 'field' = 'field', lock = false) {
  const programme = await Programme.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!programme) throw as === 'param' ? notFound('Programme') : badRequest('programmeId: no such programme', 'programmeId');
  return programme;
}

/** Escapes LIKE wildcards in user text. */
export const likePattern = (text: string) => `%${text.replace(/[%_\\]/g, '\\$&')}%`;
