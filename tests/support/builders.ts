import { randomBytes } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import type { Role } from '../../shared/roles';
import { User, OutboxMessage } from '../../server/models';
import { hashPassword } from '../../server/services/passwords';
import { Op } from 'sequelize';

let counter = 0;

/** A name no other test in this database uses. */
export function unique(prefix = 'x') {
  counter += 1;
  return `${prefix}-${counter}-${randomBytes(3).toString('hex')}`;
}

export const uniqueEmail = (prefix = 'person') => `${unique(prefix)}@test.example`;

export interface TestUser {
  user: User;
  email: string;
  password: string;
}

/** An active user with a known password, stored directly (bcrypt cost 10). */
export async function buildUser(input: { role: Role; active?: boolean; password?: string | null; name?: string } ): Promise<TestUser> {
  const email = uniqueEmail(input.role);
  const password = input.password === undefined ? `pw-${randomBytes(8).toString('hex')}` : input.password;
  const user = await User.create({
    email,
    name: input.name ?? `Test ${input.role} ${counter}`,
    role: input.role,
    passwordHash: password === null ? null : await hashPassword(password, 10),
    active: input.active ?? true,
    lastSignInAt: null,
    invitedBy: null,
  });
  return { user, email, password: password ?? '' };
}

/** A supertest agent holding a session cookie for the user. */
export async function signedInAgent(app: Express, who: TestUser) {
  const agent = request.agent(app);
  const response = await agent.post('/api/session').send({ email: who.email, password: who.password });
  if (response.status !== 201) throw new Error(`sign-in for test user failed: ${response.status} ${JSON.stringify(response.body)}`);
  return agent;
}

/** One signed-in agent per role. */
export async function agentsForEveryRole(app: Express) {
  const roles: Role[] = ['admin', 'manager', 'formulator', 'scientist', 'viewer'];
  const entries = await Promise.all(
    roles.map(async (role) => {
      const who = await buildUser({ role });
      return [role, { ...who, agent: await signedInAgent(app, who) }] as const;
    }),
  );
  return Object.fromEntries(entries) as Record<Role, TestUser & { agent: ReturnType<typeof request.agent> }>;
}

/** The newest outbox message addressed to this e-mail, or null. */
export async function latestMailTo(email: string) {
  return OutboxMessage.findOne({ where: { recipients: { [Op.like]: `%${email}%` } }, order: [['id', 'DESC']] });
}

/**
 * The newest message to this e-mail once one has arrived (mail sent after the reply, such as a
 * password reset, lands a moment after the answer); throws after `timeoutMs`.
 */
export async function mailArrivingFor(email: string, subject: RegExp = /./, timeoutMs = 5000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const mail = await latestMailTo(email);
    if (mail && subject.test(mail.subject ?? '')) return mail;
    if (Date.now() > until) throw new Error(`no mail reached ${email} within ${timeoutMs} ms`);
    await new Promise((done) => setTimeout(done, 25));
  }
}

/** The one-time link in a message body, or throws. */
export function linkIn(text: string | null, path: string): URL {
  const match = new RegExp(`https?://\\S+${path.replace('/', '\\/')}\\?token=[\\w-]+`).exec(text ?? '');
  if (!match) throw new Error(`no ${path} link in message: ${text}`);
  return new URL(match[0]);
}
