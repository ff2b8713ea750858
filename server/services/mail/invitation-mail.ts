import { ROLE_LABELS, type Role } from '../../../shared/roles';
import { escapeHtml, mailButton, mailLayout, TEXT_FOOTER } from './layout';
import type { MailMessage } from './mailer';

export function invitationMail(input: {
  to: string;
  householdName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresOn: string;
}): MailMessage {
  const role = ROLE_LABELS[input.role].toLowerCase();
  const subject = `${input.inviterName} invites you to ${input.householdName} on Larderly`;
  const lead = `${input.inviterName} would like you to join ${input.householdName} as a ${role}: you will share the shelf, the fridge and the week's meals.`;
  const text = `${lead}\n\nJoin here (the link works once, until ${input.expiresOn}):\n${input.link}\n\nIf you did not expect this, ignore it; nothing happens without the link.${TEXT_FOOTER}`;
  const html = mailLayout(
    subject,
    `<p>${escapeHtml(lead)}</p>${mailButton(input.link, `Join ${input.householdName}`)}<p style="font-size:14px">The link works once, until ${escapeHtml(input.expiresOn)}. If you did not expect this, ignore it; nothing happens without the link.</p>`,
  );
  return { to: input.to, subject, text, html };
}

/** To a keeper: their invitation was used by a signed-in account with another address, which confirmed it. */
export function invitationUsedElsewhereMail(input: {
  to: string;
  householdName: string;
  invitedEmail: string;
  joinerName: string;
  joinerEmail: string;
  role: Role;
  link: string;
}): MailMessage {
  const role = ROLE_LABELS[input.role].toLowerCase();
  const subject = `${input.joinerName} joined ${input.householdName} with an invitation sent to ${input.invitedEmail}`;
  const lead = `The invitation you sent to ${input.invitedEmail} was used by ${input.joinerName} (${input.joinerEmail}), who confirmed joining with that other address. They are now a ${role} of ${input.householdName}.`;
  const advice = 'If you do not know this person, remove them from the household under Household, Members.';
  const text = `${lead}\n\n${advice}\n${input.link}${TEXT_FOOTER}`;
  const html = mailLayout(
    subject,
    `<p>${escapeHtml(lead)}</p><p>${escapeHtml(advice)}</p>${mailButton(input.link, 'Open Household')}`,
  );
  return { to: input.to, subject, text, html };
}
