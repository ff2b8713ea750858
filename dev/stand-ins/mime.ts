// Just enough MIME to read what nodemailer sends: headers, multipart bodies, quoted-printable, base64.

export interface ReadMessage {
  headers: Map<string, string>;
  text: string;
  html: string;
}

function splitHead(raw: string) {
  const at = raw.search(/\r?\n\r?\n/);
  const head = at === -1 ? raw : raw.slice(0, at);
  const body = at === -1 ? '' : raw.slice(at).replace(/^\r?\n\r?\n/, '');
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeQuotedPrintable(text: string) {
  const bytes: number[] = [];
  const joined = text.replace(/=\r?\n/g, '');
  for (let i = 0; i < joined.length; i += 1) {
    if (joined[i] === '=' && /^[0-9A-F]{2}$/i.test(joined.slice(i + 1, i + 3))) {
      bytes.push(parseInt(joined.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(...Buffer.from(joined[i], 'utf8'));
  }
  return Buffer.from(bytes).toString('utf8');
}

function decodeBody(body: string, encoding = '') {
  if (/quoted-printable/i.test(encoding)) return decodeQuotedPrintable(body);
  if (/base64/i.test(encoding)) return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  return body;
}

/** RFC 2047 encoded words, as in a subject with non-ASCII letters. */
export function decodeHeader(value: string) {
  return value.replace(/=\?([^?]+)\?([BQ])\?([^?]*)\?=\s*/gi, (_m, _charset, kind: string, data: string) =>
    kind.toUpperCase() === 'B'
      ? Buffer.from(data, 'base64').toString('utf8')
      : decodeQuotedPrintable(data.replace(/_/g, ' ')),
  );
}

export function readMessage(raw: string): ReadMessage {
  const { headers, body } = splitHead(raw);
  const found = { text: '', html: '' };
  const walk = (partHeaders: Map<string, string>, partBody: string) => {
    const type = partHeaders.get('content-type') ?? 'text/plain';
    const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
    if (/^multipart\//i.test(type) && boundary) {
      const pieces = partBody.split(`--${boundary}`).slice(1);
      for (const piece of pieces) {
        if (piece.startsWith('--')) break;
        const part = splitHead(piece.replace(/^\r?\n/, ''));
        walk(part.headers, part.body);
      }
      return;
    }
    const decoded = decodeBody(partBody, partHeaders.get('content-transfer-encoding')).replace(/\r?\n$/, '');
    if (/^text\/html/i.test(type)) found.html ||= decoded;
    else if (/^text\/plain/i.test(type)) found.text ||= decoded;
  };
  walk(headers, body);
  return { headers, ...found };
}
