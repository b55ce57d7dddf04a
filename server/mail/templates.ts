import { LIMITS } from '../../shared/limits';
import { ROLE_LABELS, type Role } from '../../shared/roles';
import type { MailMessage } from './mailer';

const signature = '\n\n— Gelwright, on behalf of your team\n';

export function invitationMail(input: { to: string; name: string; role: Role; inviter: string; link: string }): MailMessage {
  return {
    to: [input.to],
    subject: 'You are invited to Gelwright',
    text:
      `Hello ${input.name},\n\n${input.inviter} has invited you to Gelwright as ${ROLE_LABELS[input.role]}.\n` +
      `Choose a password here to finish setting up your account:\n\n${input.link}\n\n` +
      `The link works once and expires in ${LIMITS.invitationHours} hours.` +
      signature,
  };
}

export function passwordResetMail(input: { to: string; name: string; link: string }): MailMessage {
  return {
    to: [input.to],
    subject: 'Reset your Gelwright password',
    text:
      `Hello ${input.name},\n\nSomeone (probably you) asked to reset your Gelwright password.\n` +
      `Choose a new one here:\n\n${input.link}\n\n` +
      `The link works once and expires in ${LIMITS.resetMinutes} minutes. If you did not ask, ignore this message; ` +
      `your password stays as it is.` +
      signature,
  };
}
