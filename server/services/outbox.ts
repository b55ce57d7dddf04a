import { Op } from 'sequelize';
import type { OutboxQuery } from '../../shared/schemas/team';
import { notFound } from '../errors';
import { OutboxMessage } from '../models';
import { likePattern } from './lookups';
import { paged } from './paging';

/** One page of the e-mails the installation sent, newest first, by recipient. */
export async function listOutbox(query: OutboxQuery) {
  const where = query.to ? { recipients: { [Op.like]: likePattern(query.to) } } : {};
  return OutboxMessage.findAndCountAll({ where, order: [['id', 'DESC']], ...paged(query) });
}

/** One sent e-mail, or a 404. */
export async function loadOutboxMessage(id: number) {
  const message = await OutboxMessage.findByPk(id);
  if (!message) throw notFound('Message');
  return message;
}
