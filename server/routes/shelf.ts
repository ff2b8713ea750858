import { Router } from 'express';
import { z } from 'zod';
import { importBody } from '../../shared/schemas/batches';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { byPerson, limit, MINUTE } from '../http/rate-limits';
import { body, query } from '../http/validate';
import { shelfCsv } from '../services/shelf/csv-export';
import { checkImport, importBatches } from '../services/shelf/csv-import';

export function shelfRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  // Each check reads up to 500 kB and each import writes up to 500 batches: an hour's worth per person and per address.
  const importsPerPerson = limit(ctx.sequelize, 'shelf-imports-person', {
    windowMs: 60 * MINUTE,
    limit: 60,
    what: 'CSV imports and checks',
    key: byPerson,
  });
  const importsPerAddress = limit(ctx.sequelize, 'shelf-imports-address', {
    windowMs: 60 * MINUTE,
    limit: 200,
    what: 'CSV imports and checks from this network',
  });

  router.get('/shelf.csv', householdAccess('read'), async (req, res) => {
    const { jars } = query(req, z.object({ jars: z.enum(['on-hand', 'all']).default('on-hand') }));
    const { household } = currentMembership(req);
    const csv = await shelfCsv(household, jars === 'all');
    const fileName = `larderly-shelf-${household.name.toLowerCase().replace(/[^a-z0-9]+/g, '-')}.csv`;
    res
      .set({
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': `attachment; filename="${fileName}"`,
        'Cache-Control': 'no-store',
      })
      .send(`\uFEFF${csv}`);
  });

  router.post('/shelf/import', householdAccess('cook'), importsPerPerson, importsPerAddress, async (req, res) => {
    const { csv, commit } = body(req, importBody);
    const { household } = currentMembership(req);
    if (!commit) {
      const { rows, problems } = await checkImport(household, csv);
      return void res.json({ rows, problems });
    }
    res.status(201).json(await importBatches(ctx.sequelize, household, csv, req.user!.id));
  });

  return router;
}
