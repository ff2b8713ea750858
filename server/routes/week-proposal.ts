import { Router, type Request } from 'express';
import { weekStartOf } from '../../shared/schemas/week';
import { proposalAccept, proposalRequest, proposalUndo, wasteQuery } from '../../shared/schemas/week-proposal';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, query } from '../http/validate';
import { deletePlanEntries } from '../services/week/plan-entries';
import { acceptProposal, proposeWeek, weekWaste } from '../services/week/proposal';

/**
 * The week board's meal proposal, under /api/households/:hid (cooks and keepers, as for planning):
 * POST /week/proposal { start, scope, varietyDays?, keep?, avoid? } proposes meals for the open slots (writes nothing),
 * POST /week/proposal/accept { entries } plans them as drops on the board would, in one transaction,
 * POST /week/proposal/undo { entryIds } takes an accepted proposal back, in one transaction;
 * GET /week/waste?start= is the week's waste as planned, for every member.
 */
export function weekProposalRouter({ sequelize }: AppContext) {
  const router = Router({ mergeParams: true });
  const householdOf = (req: Request) => currentMembership(req).household;
  const hid = (req: Request) => currentMembership(req).householdId;

  router.get('/week/waste', householdAccess('read'), async (req, res) => {
    const household = householdOf(req);
    const start = weekStartOf(query(req, wasteQuery).start, household.weekStartsOn);
    res.set('Cache-Control', 'no-store').json(await weekWaste(sequelize, household, start));
  });

  router.post('/week/proposal', householdAccess('cook'), async (req, res) => {
    const household = householdOf(req);
    const request = body(req, proposalRequest);
    res.json(
      await proposeWeek(sequelize, household, {
        ...request,
        start: weekStartOf(request.start, household.weekStartsOn),
      }),
    );
  });

  router.post('/week/proposal/accept', householdAccess('cook'), async (req, res) => {
    res.status(201).json({ entryIds: await acceptProposal(sequelize, hid(req), body(req, proposalAccept)) });
  });

  router.post('/week/proposal/undo', householdAccess('cook'), async (req, res) => {
    res.json({ removed: await deletePlanEntries(sequelize, hid(req), body(req, proposalUndo).entryIds) });
  });

  return router;
}
