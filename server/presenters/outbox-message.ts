import type { OutboxMessage } from '../models';

/**
 * Password-reset links are shown without their token: an administrator reading the outbox
 * must not be able to take over someone's account. (Invitation links stay: the administrator
 * issued them.) The stored message is kept as it was sent.
 */
export function hideResetTokens(text: string | null): string | null {
  return text === null ? null : text.replace(/(\/reset-password\?token=)[A-Za-z0-9_-]+/g, '$1(hidden)');
}

/** An outbox message: a preview in lists, the whole text and HTML alone. */
export function presentOutboxMessage(m: OutboxMessage, withBody: boolean) {
  return {
    id: m.id,
    sender: m.sender,
    recipients: m.recipients,
    subject: m.subject,
    transport: m.transport,
    createdAt: m.createdAt.toISOString(),
    ...(withBody ? { text: hideResetTokens(m.textBody), html: hideResetTokens(m.htmlBody) } : { preview: (hideResetTokens(m.textBody) ?? '').slice(0, 160) }),
  };
}
