import { createHash } from 'node:crypto';
import { promisify } from 'node:util';
import zlib from 'node:zlib';
import type { Request, Response } from 'express';
import { currentMembership } from '../auth/guards';
import { todayIn } from '../services/clock';
import { bothVersions, householdMemo } from '../services/household-memo';
import { COMPRESS_FROM_BYTES } from './compress-answers';

interface Answer {
  /** The JSON as sent, encoded once (res.send would encode a string again on every request). */
  body: Buffer;
  etag: string;
  /** The body compressed, made once per answer the first time a browser asks for each encoding. */
  encoded: Partial<Record<Encoding, Promise<Buffer>>>;
}

type Encoding = 'br' | 'gzip';
const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);
const compress: Record<Encoding, (body: Buffer) => Promise<Buffer>> = {
  br: (body) => brotli(body, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 5 } }),
  gzip: (body) => gzip(body),
};

/** What a cached answer is made from: the household's data, and (unless said otherwise) its planned meals. */
export interface ReadsOf {
  /** False only for an answer that reads no plan entry, not even through the week's allocation or the forecast. */
  plan: boolean;
}

/**
 * Keeps each household read's answer (as sent) until the household's versions it reads move.
 * The versions are read with the guard on every request and change in the same transaction as any
 * write (migrations 0085, 0200), so an answer is never older than the last write, whichever process wrote it
 * (services/household-memo.ts, whose rule this is). Requests that miss at once share one computation.
 */
export function createReadCache(maxEntries = 2_000) {
  const answers = householdMemo<Answer>(maxEntries);

  /** The answer as sent: its JSON encoded once, with its ETag. */
  async function answerOf(compute: () => Promise<unknown>): Promise<Answer> {
    const body = Buffer.from(JSON.stringify(await compute()));
    return { body, etag: `W/"${createHash('sha1').update(body).digest('base64url')}"`, encoded: {} };
  }

  return {
    /**
     * Answers with the cached JSON for this household, `key` and today, computing it when the version moved;
     * a matching If-None-Match gets 304. `key` must hold everything else the answer depends on; `reads` may say
     * the answer reads no planned meal, so that a plan edit leaves it be.
     */
    async send(
      req: Request,
      res: Response,
      key: string,
      compute: () => Promise<unknown>,
      reads: ReadsOf = { plan: true },
    ) {
      const { householdId, household, versions } = currentMembership(req);
      const fullKey = `${householdId} ${todayIn(household.timeZone)} ${key}`;
      const version = reads.plan ? bothVersions(versions) : versions.data;
      const answer = await answers(fullKey, version, () => answerOf(compute));
      // Cache-Control stays the API's own (private, no-store, app.ts); a client that sends If-None-Match still gets 304.
      res
        .set({
          ETag: answer.etag,
          'Content-Type': 'application/json; charset=utf-8',
        })
        .vary('Accept-Encoding');
      const encoding = answer.body.length >= COMPRESS_FROM_BYTES ? req.acceptsEncodings('br', 'gzip') : false;
      if (!encoding || req.fresh) return void res.send(answer.body);
      const chosen = encoding as Encoding;
      answer.encoded[chosen] ??= compress[chosen](answer.body);
      res.set('Content-Encoding', chosen).send(await answer.encoded[chosen]);
    },
  };
}

export type ReadCache = ReturnType<typeof createReadCache>;
