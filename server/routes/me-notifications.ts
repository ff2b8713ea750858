import { Router } from 'express';
import { notificationPatch } from '../../shared/schemas/notifications';
import { requireUser } from '../auth/guards';
import { body } from '../http/validate';
import { updateSettings, viewSettings } from '../services/notification-preferences';

/** /api/me/notifications: the signed-in person's reminder choices. */
export function meNotificationsRouter() {
  const router = Router();
  router.get('/notifications', requireUser, async (req, res) => {
    res.json({ settings: await viewSettings(req.user!.id) });
  });
  router.patch('/notifications', requireUser, async (req, res) => {
    res.json({ settings: await updateSettings(req.user!.id, body(req, notificationPatch)) });
  });
  return router;
}
