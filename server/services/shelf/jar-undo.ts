// Putting a jar back: an open, finish, discard or gift reversed by a new event, never by erasing one.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { JarState } from '../../../shared/domain';
import { JAR_UNDO_MINUTES, type JarActed, type JarChange } from '../../../shared/schemas/batches';
import { can, type Role } from '../../../shared/roles';
import { Batch, Household, Jar, JarEvent, Place, Product, User } from '../../db/models';
import type { JarBefore } from '../../db/models/jar-event';
import { conflict, forbidden, notFound } from '../../http/errors';
import { clock, todayIn } from '../clock';
import { undoJarEnding } from '../stock/jar-stock';
import { jarView, shelfClock } from './views';

const REVERSIBLE = ['opened', 'finished', 'discarded', 'given'] as const;
type Reversible = (typeof REVERSIBLE)[number];
const AFTER: Record<Reversible, JarState> = {
  opened: 'opened',
  finished: 'finished',
  discarded: 'discarded',
  given: 'given',
};

export function jarBefore(jar: Jar): JarBefore {
  const { state, openedOn, useBy, finishedOn, discardedOn, givenOn, givenTo, remainingTbsp } = jar;
  return {
    state,
    openedOn: openedOn ?? null,
    useBy: useBy ?? null,
    finishedOn: finishedOn ?? null,
    discardedOn: discardedOn ?? null,
    givenOn: givenOn ?? null,
    givenTo: givenTo ?? null,
    remainingTbsp: Number(remainingTbsp),
  };
}

/** Events written before undo existed carry no snapshot; their earlier state follows from the jar's dates. */
function inferredBefore(kind: Reversible, jar: Jar): JarBefore {
  const now = jarBefore(jar);
  if (kind === 'opened')
    return { ...now, state: 'sealed', openedOn: null, useBy: null, remainingTbsp: Number(jar.capacityTbsp) };
  const wasOpened = kind === 'finished' || jar.openedOn !== null;
  // How much a finished jar held is not recorded; a full jar's worth errs toward showing it, not hiding it.
  const remainingTbsp = kind === 'finished' || now.remainingTbsp <= 0 ? Number(jar.capacityTbsp) : now.remainingTbsp;
  return {
    ...now,
    state: wasOpened ? 'opened' : 'sealed',
    finishedOn: null,
    discardedOn: null,
    givenOn: null,
    givenTo: null,
    remainingTbsp,
  };
}

const latestEvent = (jarId: string, transaction?: Transaction) =>
  JarEvent.findOne({
    where: { jarId },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    transaction,
  });

/** The jar's latest change, which is what a put-back would reverse. */
export async function lastJarChange(householdId: string, jarId: string): Promise<JarChange | null> {
  const event = await latestEvent(jarId);
  if (!event || event.householdId !== householdId) return null;
  return {
    eventId: event.id,
    kind: event.kind,
    happenedOn: event.happenedOn,
    at: event.createdAt.toISOString(),
    who: (event as JarEvent & { user?: User | null }).user?.name ?? null,
    byUserId: event.userId,
  };
}

/**
 * Reverses one open, finish, discard or gift. It must still be the jar's latest change (the jar row is
 * locked while we look), so two people undoing at once, or an undo racing a new action, cannot both win.
 * Helpers may undo their own action for a short while; cooks and keepers may put a jar back any time.
 */
export async function undoJarEvent(
  sequelize: Sequelize,
  household: Household,
  role: Role,
  userId: string,
  jarId: string,
  eventId: string,
): Promise<JarActed> {
  try {
    return await sequelize.transaction(async (transaction) => {
      const jar = await Jar.findOne({
        where: { id: jarId, householdId: household.id },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!jar) throw notFound('That jar');
      const event = await latestEvent(jar.id, transaction);
      if (!event || event.id !== eventId) {
        throw conflict(
          `Jar ${jar.code} has changed since (it is ${jar.state} now), so that can no longer be undone. Refresh to see its state.`,
        );
      }
      if (!(REVERSIBLE as readonly string[]).includes(event.kind))
        throw conflict(`Jar ${jar.code} has nothing to put back.`);
      const kind = event.kind as Reversible;
      if (!can(role, 'cook')) {
        const recent = clock.now().getTime() - event.createdAt.getTime() <= JAR_UNDO_MINUTES * 60_000;
        if (event.userId !== userId || !recent) {
          throw forbidden(
            `A helper can undo only their own change, within ${JAR_UNDO_MINUTES} minutes. Ask a cook or keeper to put jar ${jar.code} back.`,
          );
        }
      }
      const before = event.stateBefore ?? inferredBefore(kind, jar);
      const [count] = await Jar.update(before, { where: { id: jar.id, state: AFTER[kind] }, transaction });
      if (count === 0) throw conflict(`Jar ${jar.code} is ${jar.state} now; refresh to see its state.`);
      const restored = await JarEvent.create(
        {
          householdId: household.id,
          jarId: jar.id,
          batchId: jar.batchId,
          kind: 'restored',
          userId,
          happenedOn: todayIn(household.timeZone),
          undoesEventId: event.id,
          stateBefore: jarBefore(jar),
        },
        { transaction },
      );
      await undoJarEnding(sequelize, household.id, event.id, userId, restored.id, transaction);
      const [batch, product] = await Promise.all([
        Batch.findByPk(jar.batchId, { transaction }),
        Product.findByPk(jar.productId, { transaction }),
      ]);
      await jar.reload({ transaction, include: [{ model: Place, as: 'place', required: false }] });
      return { jar: jarView(jar, batch!, product!, shelfClock(household)), eventId: restored.id };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict('That change was already undone. Refresh to see the jar now.');
    throw error;
  }
}
