import { createHash } from 'node:crypto';
import type { Request, Response } from 'express';
import { currentMembership } from '../auth/guards';
import { todayIn } from '../services/clock';

interface Answer {
  body: string;
  etag: string;
}

/**
 * Keeps each household read's answer (as sent) until the household's data version moves.
 * The version is read with the guard on every request and changes in the same transaction as any
 * write (migration 0085), so an answer is never older than the last write, whichever process wrote it.
 * Requests that miss at once share one computation.
 */
export function createReadCache(maxEntries = 2_000) {
  const answers = new Map<string, { version: string; answer: Promise<Answer> }>();

  function remember(key: string, version: string, compute: () => Promise<unknown>) {
    const answer = compute().then((value) => {
      const body = JSON.stringify(value);
      return { body, etag: `W/"${createHash('sha1').update(body).digest('base64url')}"` };
    });
    answers.delete(key);
    answers.set(key, { version, answer });
    if (answers.size > maxEntries) answers.delete(answers.keys().next().value!);
    answer.catch(() => answers.get(key)?.answer === answer && answers.delete(key));
    return answer;
  }

  return {
    /**
     * Answers with the cached JSON for this household, `key` and today, computing it when the version moved;
     * a matching If-None-Match gets 304. `key` must hold everything else the answer depends on.
     */
    async send(req: Request, res: Response, key: string, compute: () => Promise<unknown>) {
      const { householdId, household, dataVersion } = currentMembership(req);
      const fullKey = `${householdId} ${todayIn(household.timeZone)} ${key}`;
      const held = answers.get(fullKey);
      const { body, etag } = await (held?.version === dataVersion ? held.answer : remember(fullKey, dataVersion, compute));
      // no-cache: a browser may keep the answer but asks again every time, and gets 304 while it is current.
      res.set({ 'Cache-Control': 'private, no-cache', ETag: etag, 'Content-Type': 'application/json; charset=utf-8' }).send(body);
    },
  };
}

export type ReadCache = ReturnType<typeof createReadCache>;
