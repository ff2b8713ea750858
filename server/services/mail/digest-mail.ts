import { dateWords, SLOT_NAMES, USE_BY_CAUTION_SENTENCE } from '../../../shared/words';
import { escapeHtml, mailButton, mailLayout, TEXT_FOOTER } from './layout';
import type { MailMessage } from './mailer';

export interface DigestContent {
  householdName: string;
  weekOf: string;
  plan: { date: string; slot: string; title: string; products: string[] }[];
  toOpen: { date: string; productName: string }[];
  expiring: { useBy: string; productName: string; code: string }[];
  /** filled by the restock feature; an empty list leaves the section out */
  restock: { productName: string; reason: string }[];
  link: string;
}

function section(title: string, lines: string[], empty: string, note = '') {
  return {
    text: `${title}\n${lines.length ? lines.map((l) => `- ${l}`).join('\n') : empty}\n${note && lines.length ? `${note}\n` : ''}`,
    html: `<h2 style="font-size:17px;margin:20px 0 6px">${escapeHtml(title)}</h2>${
      lines.length
        ? `<ul style="padding-left:20px;margin:0">${lines.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>`
        : `<p style="margin:0">${escapeHtml(empty)}</p>`
    }${note && lines.length ? `<p style="margin:6px 0 0;font-size:14px">${escapeHtml(note)}</p>` : ''}`,
  };
}

const slotName = (slot: string) => SLOT_NAMES[slot as keyof typeof SLOT_NAMES] ?? slot;

export function digestMail(to: string, digest: DigestContent): MailMessage {
  // The same date words as the app ("Tue, Jun 9"), counted from the digest's own week so the year shows only when it changes.
  const thisYear = Number(digest.weekOf.slice(0, 4));
  const day = (isoDate: string) => dateWords(isoDate, thisYear);
  const sections = [
    section(
      'This week’s plan',
      digest.plan.map(
        (p) =>
          `${day(p.date)} at ${slotName(p.slot).toLowerCase()}: ${p.title}${p.products.length ? ` with ${p.products.join(', ')}` : ''}`,
      ),
      'Nothing is planned yet.',
    ),
    section(
      'Jars to open',
      digest.toOpen.map((o) => `${day(o.date)}: open a new jar of ${o.productName}`),
      'No new jars need opening.',
    ),
    section(
      'Use by this week',
      digest.expiring.map((e) => `${day(e.useBy)}: ${e.productName} (jar ${e.code})`),
      'No opened jar reaches its use-by this week.',
      USE_BY_CAUTION_SENTENCE,
    ),
    ...(digest.restock.length
      ? [
          section(
            'Restock suggestions',
            digest.restock.map((r) => `${r.productName}: ${r.reason}`),
            '',
          ),
        ]
      : []),
  ];
  const subject = `${digest.householdName}: the week of ${day(digest.weekOf)}`;
  return {
    to,
    subject,
    text: `${subject}\n\n${sections.map((s) => s.text).join('\n')}\n${digest.link}${TEXT_FOOTER}`,
    html: mailLayout(subject, sections.map((s) => s.html).join('') + mailButton(digest.link, 'Open the week')),
  };
}
