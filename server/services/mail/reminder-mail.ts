import type { ReminderKind } from '../../db/models/reminder-delivery';
import { USE_BY_CAUTION_PUSH, USE_BY_CAUTION_SENTENCE } from '../../../shared/words';
import { escapeHtml, mailButton, mailLayout, TEXT_FOOTER } from './layout';
import type { MailMessage } from './mailer';

export interface ReminderWords {
  title: string;
  body: string;
}

/** The words of a use-by reminder, shared by the push notification and the e-mail (which adds the full caution). */
export function reminderWords(
  kind: Exclude<ReminderKind, 'seal-check'>,
  productName: string,
  daysLeft: number,
  code: string,
): ReminderWords {
  if (kind === 'today') {
    return {
      title: `Use the ${productName} today`,
      body: `The opened jar ${code} of ${productName} reaches its use-by today. Finish it, or discard what is left. ${USE_BY_CAUTION_PUSH}`,
    };
  }
  const days = daysLeft === 1 ? '1 day' : `${daysLeft} days`;
  return {
    title: `Use the ${productName} within ${days}`,
    body: `The opened jar ${code} of ${productName} should be finished within ${days}. ${USE_BY_CAUTION_PUSH}`,
  };
}

/** A reminder e-mail: a use-by reminder by default; a seal check names its own button and carries the canning caution. */
export function reminderMail(input: {
  to: string;
  words: ReminderWords;
  householdName: string;
  link: string;
  button?: string;
  caution?: string;
}): MailMessage {
  const { title, body } = input.words;
  const caution = input.caution ?? USE_BY_CAUTION_SENTENCE;
  const text = `${body}\n\n${input.householdName}: ${input.link}\n\n${caution}${TEXT_FOOTER}`;
  const html = mailLayout(
    title,
    `<p>${escapeHtml(body)}</p>${mailButton(input.link, input.button ?? 'Open the jar')}<p style="font-size:14px">${escapeHtml(caution)}</p>`,
  );
  return { to: input.to, subject: `${title} (${input.householdName})`, text, html };
}
