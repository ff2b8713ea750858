/** Escapes text for HTML, so names typed by people never become markup. */
export function escapeHtml(text: string) {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

// Inline styles only: mail programs drop style sheets. Colours follow the app's paper, ink and garden green.
const PAPER = '#faf6ee';
const INK = '#2a2520';
const GREEN = '#2f5d3a';

const HOUSEHOLD_FOOTER =
  'You get this because you share a household on Larderly. Change what you receive under Household, Notifications.';

/** The frame every Larderly e-mail shares; `body` is already-escaped HTML, `footer` plain text. */
export function mailLayout(title: string, body: string, footer = HOUSEHOLD_FOOTER) {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(title)}</title></head>
<body style="margin:0;background:${PAPER};color:${INK};font-family:Karla,Helvetica,Arial,sans-serif;line-height:1.5">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="margin:0 0 16px;font-weight:bold;color:${GREEN}">Larderly</p>
<h1 style="font-size:22px;margin:0 0 12px">${escapeHtml(title)}</h1>
${body}
<p style="margin-top:32px;font-size:13px;color:#6b6259">${escapeHtml(footer)}</p>
</div></body></html>`;
}

export function mailButton(href: string, label: string) {
  return `<p style="margin:20px 0"><a href="${escapeHtml(href)}" style="display:inline-block;background:${GREEN};color:#fff;padding:12px 20px;border-radius:8px;text-decoration:none;font-weight:bold">${escapeHtml(label)}</a></p>`;
}

export const TEXT_FOOTER = `\n--\n${HOUSEHOLD_FOOTER}\n`;
