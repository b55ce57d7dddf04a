import { Op } from 'sequelize';
import { LIMITS } from '../../shared/limits';
import type { PageQuery } from '../../shared/schemas/common';
import type { CreateInvitationInput, UpdateUserInput } from '../../shared/schemas/team';
import { conflict, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { invitationMail, passwordResetMail } from '../mail/templates';
import { User } from '../models';
import type { HttpError } from '../errors';
import type { TokenPurpose } from '../models/user-token';
import { findLiveToken, issueToken, revokeTokens } from './one-time-links';
import { paged } from './paging';
import { hashPassword } from './passwords';
import { endSessions } from './sessions';

type Ctx = HandlerContext<unknown, unknown, unknown>;

function link(ctx: Ctx, path: string, token: string) {
  return new URL(`${path}?token=${encodeURIComponent(token)}`, ctx.deps.config.PUBLIC_URL).toString();
}

/** One page of everyone in the installation, by name. */
export async function listUsers(query: PageQuery) {
  return User.findAndCountAll({ order: [['name', 'ASC']], ...paged(query) });
}

/**
 * Invites a person: creates the account (inactive, without password) or refreshes a pending
 * invitation, issues a one-time link and e-mails it once the transaction has committed.
 */
export async function inviteUser(ctx: Ctx, input: CreateInvitationInput): Promise<User> {
  const transaction = ctx.transaction;
  let user = await User.findOne({ where: { email: input.email }, transaction, lock: transaction?.LOCK.UPDATE });
  if (user && user.passwordHash !== null) throw conflict(`${input.email} already has an account`, { field: 'email' });
  if (user) {
    user.name = input.name;
    user.role = input.role;
    await user.save({ transaction });
  } else {
    user = await User.create(
      { email: input.email, name: input.name, role: input.role, passwordHash: null, active: false, lastSignInAt: null, invitedBy: ctx.user!.id },
      { transaction },
    );
  }
  const token = await issueToken(
    { userId: user.id, purpose: 'invitation', lifetimeMs: LIMITS.invitationHours * 3600_000, createdBy: ctx.user!.id },
    transaction,
  );
  await ctx.audit({ action: 'invitation.created', entityType: 'user', entityId: user.id, details: { email: user.email, role: user.role } });
  const mail = invitationMail({ to: user.email, name: user.name, role: user.role, inviter: ctx.user!.name, link: link(ctx, '/accept-invitation', token) });
  ctx.afterCommit(() => ctx.deps.mailer.send(mail));
  return user;
}

/** Issues and e-mails a reset link for an active account; unknown addresses do nothing, silently. */
export async function requestPasswordReset(ctx: Ctx, email: string): Promise<void> {
  const user = await User.findOne({ where: { email, active: true, passwordHash: { [Op.ne]: null } }, transaction: ctx.transaction });
  await ctx.audit({ actorId: user?.id ?? null, action: 'password_reset.requested', entityType: 'user', entityId: user?.id ?? null, details: { known: Boolean(user) } });
  if (!user) return;
  const token = await issueToken({ userId: user.id, purpose: 'reset', lifetimeMs: LIMITS.resetMinutes * 60_000, createdBy: null }, ctx.transaction);
  const mail = passwordResetMail({ to: user.email, name: user.name, link: link(ctx, '/reset-password', token) });
  // Sent after the reply, so a known address answers as fast as an unknown one.
  ctx.afterReply(() => ctx.deps.mailer.send(mail));
}

/**
 * Changes a user's role, name or active flag. The installation always keeps one active
 * administrator, and an administrator cannot deactivate or demote themselves.
 */
export async function updateUser(ctx: Ctx, id: number, input: UpdateUserInput): Promise<User> {
  const transaction = ctx.transaction;
  const user = await User.findByPk(id, { transaction, lock: transaction?.LOCK.UPDATE });
  if (!user) throw notFound('User');
  const losesAdmin = user.role === 'admin' && user.active && ((input.role && input.role !== 'admin') || input.active === false);
  if (losesAdmin && user.id === ctx.user!.id) throw conflict('You cannot remove your own administrator access', { field: input.role ? 'role' : 'active' });
  if (losesAdmin) {
    // Lock the active administrators so two concurrent demotions cannot both pass this check.
    const admins = await User.findAll({ where: { role: 'admin', active: true }, attributes: ['id'], transaction, lock: transaction?.LOCK.UPDATE });
    if (admins.length <= 1) throw conflict('Gelwright needs at least one active administrator');
  }
  if (input.role && input.role !== user.role) {
    await ctx.audit({ action: 'user.role_changed', entityType: 'user', entityId: user.id, details: { from: user.role, to: input.role } });
    user.role = input.role;
  }
  if (input.active === false && user.passwordHash === null) {
    // A pending invitee is inactive already: deactivating them withdraws the invitation link.
    const revoked = await revokeTokens(user.id, 'invitation', transaction);
    if (revoked > 0) await ctx.audit({ action: 'invitation.revoked', entityType: 'user', entityId: user.id });
  }
  if (input.active !== undefined && input.active !== user.active) {
    if (input.active && user.passwordHash === null) throw conflict('This person has not accepted the invitation yet', { field: 'active' });
    await ctx.audit({ action: input.active ? 'user.reactivated' : 'user.deactivated', entityType: 'user', entityId: user.id });
    user.active = input.active;
  }
  // A new role or a deactivation ends the person's sessions; they sign in again under the new terms.
  if (user.changed('role') || (user.changed('active') && !user.active)) user.sessionVersion += 1;
  if (input.name && input.name !== user.name) {
    await ctx.audit({ action: 'user.renamed', entityType: 'user', entityId: user.id, details: { from: user.name, to: input.name } });
    user.name = input.name;
  }
  await user.save({ transaction });
  return user;
}

/**
 * Sets a password through a one-time link (an invitation, which also activates the account, or
 * a reset, which needs an active one), spends the link and audits it, in the route's transaction.
 */
export async function setPasswordThroughLink(
  ctx: Ctx,
  input: { token: string; password: string; purpose: TokenPurpose; refusal: () => HttpError; action: string },
): Promise<User> {
  const live = await findLiveToken(input.token, input.purpose, ctx.transaction);
  if (!live || (input.purpose === 'reset' && !live.user.active)) throw input.refusal();
  live.user.passwordHash = await hashPassword(input.password, ctx.deps.config.BCRYPT_COST);
  if (input.purpose === 'invitation') live.user.active = true;
  // Whoever held a session on the old password (or stole one) is signed out.
  await endSessions(live.user, ctx.transaction);
  live.row.usedAt = new Date();
  await live.row.save({ transaction: ctx.transaction });
  await ctx.audit({ actorId: live.user.id, action: input.action, entityType: 'user', entityId: live.user.id });
  return live.user;
}
