import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';
import type { CaughtMail } from '../../shared/schemas/caught-mail';
import { decodeHeader, readMessage } from './mime';

export type { CaughtMail };

/**
 * A local SMTP server on loopback that keeps every message instead of delivering it:
 * in memory, and as one JSON file each in `dir` when given.
 */
export async function startMailCatcher(options: { port?: number; dir?: string } = {}) {
  const messages: CaughtMail[] = [];
  if (options.dir) mkdirSync(options.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    allowInsecureAuth: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Larderly local mail catcher',
    size: 5 * 1024 * 1024,
    onAuth: (_auth, _session, callback) => callback(null, { user: 'local' }),
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const read = readMessage(Buffer.concat(chunks).toString('utf8'));
        const mail: CaughtMail = {
          id: `${Date.now()}-${randomUUID().slice(0, 8)}`,
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: decodeHeader(read.headers.get('subject') ?? ''),
          text: read.text,
          html: read.html,
        };
        messages.push(mail);
        if (options.dir) writeFileSync(path.join(options.dir, `${mail.id}.json`), JSON.stringify(mail));
        callback();
      });
    },
  });
  server.on('error', (error) => console.warn(`larderly mail catcher: ${error.message}`));
  await new Promise<void>((resolve) => server.listen(options.port ?? 0, '127.0.0.1', resolve));
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  return {
    port,
    messages,
    /** the messages sent to one address */
    to: (address: string) => messages.filter((m) => m.to.includes(address)),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

export type MailCatcher = Awaited<ReturnType<typeof startMailCatcher>>;
