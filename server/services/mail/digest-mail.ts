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

function section(title: string, lines: string[], empty: string) {
  return {
    text: `${title}\n${lines.length ? lines.map((l) => `- ${l}`).join('\n') : empty}\n`,
    html: `<h2 style="font-size:17px;margin:20px 0 6px">${escapeHtml(title)}</h2>${
      lines.length ? `<ul style="padding-left:20px;margin:0">${lines.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>` : `<p style="margin:0">${escapeHtml(empty)}</p>`
    }`,
  };
}

export function digestMail(to: string, digest: DigestContent): MailMessage {
  const sections = [
    section('This week’s plan', digest.plan.map((p) => `${p.date} ${p.slot}: ${p.title}${p.products.length ? ` with ${p.products.join(', ')}` : ''}`), 'Nothing is planned yet.'),
    section('Jars to open', digest.toOpen.map((o) => `${o.date}: open a new jar of ${o.productName}`), 'No new jars need opening.'),
    section('What expires', digest.expiring.map((e) => `${e.useBy}: ${e.productName} (jar ${e.code})`), 'No opened jar reaches its use-by this week.'),
    ...(digest.restock.length ? [section('Time to make more', digest.restock.map((r) => `${r.productName}: ${r.reason}`), '')] : []),
  ];
  const subject = `${digest.householdName}: the week of ${digest.weekOf}`;
  return {
    to,
    subject,
    text: `${subject}\n\n${sections.map((s) => s.text).join('\n')}\n${digest.link}${TEXT_FOOTER}`,
    html: mailLayout(subject, sections.map((s) => s.html).join('') + mailButton(digest.link, 'Open the week')),
  };
}
