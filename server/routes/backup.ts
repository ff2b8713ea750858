import express, { Router, type RequestHandler } from 'express';
import { BACKUP_MAX_BYTES, householdBackup } from '../../shared/schemas/backup';
import { currentMembership, householdAccess, requireUser } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { byPerson, limit, MINUTE } from '../http/rate-limits';
import { parse } from '../http/validate';
import { exportHousehold, importHousehold } from '../services/backup';

/** GET /api/households/:hid/backup: the keeper's download of the whole household. */
export function householdBackupRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  router.get('/backup', householdAccess('manage'), async (req, res) => {
    const { household } = currentMembership(req);
    const backup = await exportHousehold(ctx.sequelize, household);
    const slug =
      household.name
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '') || 'household';
    const fileName = `larderly-backup-${slug}-${backup.exportedAt.slice(0, 10)}.json`;
    res.set({ 'Content-Disposition': `attachment; filename="${fileName}"`, 'Cache-Control': 'no-store' }).json(backup);
  });
  return router;
}

export const IMPORT_PATH = '/households/import';

/** The one body larger than 1 MB the API accepts, read only once the person is signed in. */
const readBackupJson = express.json({ limit: BACKUP_MAX_BYTES });
const backupBody: RequestHandler = (req, res, next) => {
  readBackupJson(req, res, (error?: { type?: string }) => {
    if (error?.type === 'entity.too.large')
      return next(new AppError(413, 'too_large', 'That backup file is too large (10 MB at most).'));
    next(error);
  });
};

/** POST /api/households/import: a new household from a backup file, with the importer as keeper. */
export function backupImportRouter(ctx: AppContext) {
  const router = Router();
  // Each import reads up to 10 MB and writes a whole household: a handful an hour is plenty.
  const importsPerPerson = limit(ctx.sequelize, 'imports-person', {
    windowMs: 60 * MINUTE,
    limit: 10,
    what: 'imports',
    key: byPerson,
  });
  const importsPerAddress = limit(ctx.sequelize, 'imports-address', {
    windowMs: 60 * MINUTE,
    limit: 30,
    what: 'imports from this network',
  });
  router.post('/import', requireUser, importsPerPerson, importsPerAddress, backupBody, async (req, res) => {
    const backup = parse(
      householdBackup,
      req.body ?? {},
      'That file is not a Larderly household backup, or it has been changed.',
    );
    res.status(201).json(await importHousehold(ctx.sequelize, backup, req.user!.id));
  });
  return router;
}
