import { escapeHtml, mailButton, mailLayout } from './layout';
import type { MailMessage } from './mailer';

// Neither mail goes to a household member yet, so the footer says why this address got it.
const FOOTER = 'You get this because someone entered this address on Larderly’s sign-up page.';
const TEXT_FOOTER = `\n--\n${FOOTER}\n`;

/** To a fresh address: the link that makes the account and its household. */
export function confirmSignUpMail(input: {
  to: string;
  name: string;
  householdName: string;
  link: string;
  expiresOn: string;
}): MailMessage {
  const subject = `Finish setting up ${input.householdName} on Larderly`;
  const lead = `Hello ${input.name}, open this link to confirm your address and create ${input.householdName}, with you as its keeper.`;
  const after = `The link works once, until ${input.expiresOn}. If you did not sign up, ignore this e-mail; no account is made without the link.`;
  const text = `${lead}\n\n${input.link}\n\n${after}${TEXT_FOOTER}`;
  const html = mailLayout(
    subject,
    `<p>${escapeHtml(lead)}</p>${mailButton(input.link, `Create ${input.householdName}`)}<p style="font-size:14px">${escapeHtml(after)}</p>`,
    FOOTER,
  );
  return { to: input.to, subject, text, html };
}

/** To the owner of an address that already has an account: someone tried to sign up with it. */
export function signUpWithTakenAddressMail(input: { to: string; name: string; signInLink: string }): MailMessage {
  const subject = 'Someone tried to sign up on Larderly with your address';
  const lead = `Hello ${input.name}, someone just tried to start a new household on Larderly with ${input.to}, which already has an account. No new account was made, and nothing in your households changed.`;
  const advice =
    'If it was you, sign in with your password instead. If it was not, you need do nothing; choose a long password you use nowhere else.';
  const text = `${lead}\n\n${advice}\n${input.signInLink}${TEXT_FOOTER}`;
  const html = mailLayout(
    subject,
    `<p>${escapeHtml(lead)}</p><p>${escapeHtml(advice)}</p>${mailButton(input.signInLink, 'Sign in to Larderly')}`,
    FOOTER,
  );
  return { to: input.to, subject, text, html };
}
