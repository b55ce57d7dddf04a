import type { MailMessage } from './mailer';

export function shortlistSubmittedMail(input: { to: string[]; title: string; author: string; programme: string; link: string; count: number }): MailMessage {
  return {
    to: input.to,
    subject: `Shortlist waiting for review: ${input.title}`,
    text:
      `${input.author} submitted the shortlist "${input.title}" (${input.count} recipe${input.count === 1 ? '' : 's'}) ` +
      `in the programme ${input.programme}. It waits for a manager's decision:\n\n${input.link}\n\n— Gelwright`,
  };
}

export function shortlistDecidedMail(input: { to: string; title: string; decision: 'approved' | 'returned'; reviewer: string; comment: string | null; link: string }): MailMessage {
  const verb = input.decision === 'approved' ? 'approved' : 'returned';
  return {
    to: [input.to],
    subject: `Shortlist ${verb}: ${input.title}`,
    text:
      `${input.reviewer} ${verb} your shortlist "${input.title}".\n` +
      (input.comment ? `\nComment: ${input.comment}\n` : '') +
      `\n${input.link}\n\n— Gelwright`,
  };
}
