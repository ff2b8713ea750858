import { randomUUID } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import https from 'node:https';
import path from 'node:path';
import { checkVapid, type VapidClaims } from './vapid-check';

/** One push message as a push service holds it: still encrypted for the browser. */
export interface CaughtPush {
  id: string;
  /** the last part of the endpoint, which stands for one browser's subscription */
  subscription: string;
  receivedAt: string;
  ttl: number;
  urgency: string;
  /** the Topic header: a later message with the same topic replaces an undelivered one */
  topic: string | null;
  vapidKey: string;
  claims: VapidClaims;
  /** the aes128gcm body, base64 */
  body: string;
}

// Push services accept at most about 4 KB of payload.
const MAX_BODY = 4096 + 100;

/**
 * A local Web Push endpoint over HTTPS on loopback: it checks the VAPID signature as a push
 * service would and keeps the encrypted payload (in memory, and as JSON files in `dir`).
 */
export async function startPushEndpoint(options: { certFile: string; keyFile: string; port?: number; dir?: string }) {
  const received: CaughtPush[] = [];
  const gone = new Set<string>();
  if (options.dir) mkdirSync(options.dir, { recursive: true });
  let origin = '';

  const server = https.createServer(
    { cert: readFileSync(options.certFile), key: readFileSync(options.keyFile) },
    (req, res) => {
      const answer = (status: number, text = '') => res.writeHead(status, { 'Content-Type': 'text/plain' }).end(text);
      const match = /^\/push\/([A-Za-z0-9_-]{8,100})$/.exec(req.url ?? '');
      if (req.method !== 'POST' || !match) return answer(404, 'Unknown push subscription.');
      const subscription = match[1];
      if (gone.has(subscription)) return answer(410, 'This subscription has expired or was unsubscribed.');
      const vapid = checkVapid(req.headers.authorization, origin);
      if (!vapid.ok) return answer(403, vapid.reason);
      if (req.headers['content-encoding'] !== 'aes128gcm') return answer(415, 'Content-Encoding must be aes128gcm.');
      const ttl = Number(req.headers.ttl);
      if (!Number.isInteger(ttl) || ttl < 0) return answer(400, 'A TTL header is required.');
      const chunks: Buffer[] = [];
      let size = 0;
      req.on('data', (chunk: Buffer) => {
        size += chunk.length;
        if (size <= MAX_BODY) chunks.push(chunk);
      });
      req.on('end', () => {
        if (size > MAX_BODY) return answer(413, 'The payload is too large.');
        const push: CaughtPush = {
          id: randomUUID(),
          subscription,
          receivedAt: new Date().toISOString(),
          ttl,
          urgency: String(req.headers.urgency ?? 'normal'),
          topic: typeof req.headers.topic === 'string' ? req.headers.topic : null,
          vapidKey: vapid.publicKey,
          claims: vapid.claims,
          body: Buffer.concat(chunks).toString('base64'),
        };
        received.push(push);
        if (options.dir) writeFileSync(path.join(options.dir, `${Date.now()}-${push.id}.json`), JSON.stringify(push));
        res.writeHead(201, { Location: `${origin}/message/${push.id}` }).end();
      });
    },
  );
  await new Promise<void>((resolve) => server.listen(options.port ?? 0, '127.0.0.1', resolve));
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  origin = `https://127.0.0.1:${port}`;

  return {
    origin,
    port,
    received,
    /** a fresh endpoint address, as a push service hands one to a browser */
    newEndpoint: () => `${origin}/push/${randomUUID().replaceAll('-', '')}`,
    /** answer 410 Gone from now on, as a push service does for an expired subscription */
    expire: (endpoint: string) => gone.add(endpoint.split('/').pop()!),
    receivedBy: (endpoint: string) => received.filter((p) => p.subscription === endpoint.split('/').pop()),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

export type PushEndpoint = Awaited<ReturnType<typeof startPushEndpoint>>;
