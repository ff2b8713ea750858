import compression from 'compression';
import type { Express, RequestHandler, Response } from 'express';

/** Answers smaller than this go out as they are: compressing them saves less than it costs. */
export const COMPRESS_FROM_BYTES = 1024;
const ENGAGED = Symbol('larderly.compressionEngaged');
type Engageable = Response & { [ENGAGED]?: true };

/**
 * The compression package, engaged only for an answer big enough to compress. Mounted as a middleware it wraps
 * every response (write, end, on, its header hook and listeners) before anyone knows the answer's size: a
 * fifth of the server's work on a small household read in `npm run bench:week`. Every API answer goes out
 * through `res.send` (res.json included), so the app's own `send` calls the same middleware at that moment,
 * when the body is there to measure; an answer already encoded (the read cache's brotli copy) is left alone.
 * The returned middleware is the package as it always runs, for what is streamed (the built client's files).
 */
export function compressAnswers(app: Express): RequestHandler {
  const compress = compression({ threshold: COMPRESS_FROM_BYTES });
  const send = app.response.send;
  app.response.send = function sendCompressed(this: Engageable, body?: unknown) {
    // A string's length in UTF-16 units is at most its length in bytes: a close enough measure of its size.
    const size = typeof body === 'string' || Buffer.isBuffer(body) ? body.length : 0;
    if (size < COMPRESS_FROM_BYTES || this[ENGAGED] || this.headersSent || this.getHeader('Content-Encoding'))
      return send.call(this, body);
    this[ENGAGED] = true;
    compress(this.req, this, () => send.call(this, body));
    return this;
  } as typeof send;
  return (req, res, next) => {
    (res as Engageable)[ENGAGED] = true;
    compress(req, res, next);
  };
}
