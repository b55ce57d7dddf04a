import { Op, type Transaction } from 'sequelize';
import { badRequest, notFound } from '../errors';
import { Programme } from '../models';

/** The programme, or a 404 (as a route parameter) / 400 naming the field (as a body field). */
export async function requireProgramme(id: number, transaction: Transaction | null, as: 'param' | 'field' = 'field', lock = false) {
  const programme = await Programme.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!programme) throw as === 'param' ? notFound('Programme') : badRequest('programmeId: no such programme', 'programmeId');
  return programme;
}

/** The programme, refused (400 on `field`) when it is archived: nothing new goes into one. */
export async function requireLiveProgramme(id: number, transaction: Transaction | null, field = 'programmeId') {
  const programme = await requireProgramme(id, transaction);
  if (programme.archivedAt) throw badRequest(`${field}: programme ${programme.name} is archived; restore it before adding to it`, field);
  return programme;
}

/** Escapes LIKE wildcards in user text. */
export const likePattern = (text: string) => `%${text.replace(/[%_\\]/g, '\\$&')}%`;

/** The where-clause of an `archived` list filter: live rows ('false'), archived ones ('true') or all. */
export function archivedWhere(archived: 'true' | 'false' | 'all'): Record<string | symbol, unknown> {
  return archived === 'all' ? {} : { archivedAt: archived === 'true' ? { [Op.ne]: null } : null };
}
