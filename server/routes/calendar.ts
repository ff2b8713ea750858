import { createHash } from 'node:crypto';
import { Router } from 'express';
import { z } from 'zod';
import { mealTimesBody } from '../../shared/schemas/calendar';
import type { Config } from '../config';
import { currentMembership, householdAccess } from '../auth/guards';
import { notFound } from '../http/errors';
import { body, params } from '../http/validate';
import { feedView, householdOfSecret, renewFeed, setMealTimes, turnOffFeed } from '../services/calendar/addresses';
import { householdCalendar } from '../services/calendar/feed';

/** The signed-in person's own calendar address for the household, and the household's meal times. */
export function householdCalendarRouter({ config }: { config: Config }) {
  const router = Router({ mergeParams: true });

  router.get('/calendar-feed', householdAccess('read'), async (req, res) => {
    res.json({ feed: await feedView(currentMembership(req).household, req.user!.id) });
  });

  // On, or renewed: the answer carries the address once; only its fingerprint is kept.
  router.post('/calendar-feed', householdAccess('read'), async (req, res) => {
    res
      .status(201)
      .json({ feed: await renewFeed(currentMembership(req).household, req.user!.id, config.publicOrigin) });
  });

  router.delete('/calendar-feed', householdAccess('read'), async (req, res) => {
    await turnOffFeed(currentMembership(req).householdId, req.user!.id);
    res.status(204).end();
  });

  router.put('/meal-times', householdAccess('manage'), async (req, res) => {
    const household = await setMealTimes(currentMembership(req).household, body(req, mealTimesBody));
    res.json({ feed: await feedView(household, req.user!.id) });
  });

  return router;
}

const FEED_FILE = z.object({
  file: z.string().regex(/^[A-Za-z0-9_-]{43}\.ics$/, 'That calendar address is not valid.'),
});
/** A fetch is recorded at most this often, so polling calendar apps do not write on every request. */
const FETCH_NOTE_MS = 60 * 60 * 1000;

/** What a calendar app polls: no session, the secret in the address is the key. */
export function calendarFeedRouter(config: Config) {
  const router = Router();
  router.get('/:file', async (req, res) => {
    const { file } = params(req, FEED_FILE);
    const found = await householdOfSecret(file.slice(0, -'.ics'.length));
    if (!found) throw notFound('That calendar address');
    const text = await householdCalendar(found.household, config.publicOrigin);
    const etag = `"${createHash('sha256').update(text).digest('base64url')}"`;
    if (!found.feed.lastFetchedAt || Date.now() - found.feed.lastFetchedAt.getTime() > FETCH_NOTE_MS)
      await found.feed.update({ lastFetchedAt: new Date() });
    res.set({
      'Cache-Control': 'private, no-cache',
      ETag: etag,
      'Referrer-Policy': 'no-referrer',
      'X-Robots-Tag': 'noindex',
    });
    if (req.headers['if-none-match']?.split(',').some((tag) => tag.trim() === etag)) {
      res.status(304).end();
      return;
    }
    res.type('text/calendar; charset=utf-8').send(text);
  });
  return router;
}
