// Shelf places: a household's own names for where jars are kept, and moving jars between them.
import { fn, col, Op, QueryTypes, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { JarsMoved, PlaceBody, PlaceView } from '../../../shared/schemas/places';
import { LIMITS } from '../../../shared/schemas/limits';
import { PLACE_NAME_TAKEN, placeHoldsJarsWords } from '../../../shared/words/shelf-places';
import { Jar, JarEvent, Place, type Household } from '../../db/models';
import { AppError, conflict, notFound } from '../../http/errors';
import { todayIn } from '../clock';

/** Only sealed jars have a shelf place that counts: an opened jar lives in the fridge. */
const ON_SHELF = ['sealed'];
const NOT_ON_SHELF: Record<string, string> = {
  opened: 'is opened, so it lives in the fridge',
  finished: 'is finished',
  discarded: 'is discarded',
  given: 'was given away',
};

function sameName(error: unknown, name: string): never {
  if (error instanceof UniqueConstraintError)
    throw new AppError(409, 'conflict', PLACE_NAME_TAKEN(name), { name: 'That name is taken.' });
  throw error;
}

export async function listPlaces(householdId: string): Promise<PlaceView[]> {
  const [places, counts] = await Promise.all([
    Place.findAll({ where: { householdId }, order: [[fn('lower', col('name')), 'ASC']] }),
    Jar.findAll({
      where: { householdId, state: ON_SHELF, placeId: { [Op.ne]: null } },
      attributes: ['placeId', [fn('count', col('id')), 'jars']],
      group: ['placeId'],
      raw: true,
    }) as unknown as Promise<{ placeId: string; jars: string }[]>,
  ]);
  const jarsAt = new Map(counts.map((row) => [row.placeId, Number(row.jars)]));
  return places.map((place) => ({ id: place.id, name: place.name, sealedJars: jarsAt.get(place.id) ?? 0 }));
}

/** With a transaction the place is share-locked, so a removal running at the same time waits, or wins first. */
export async function findPlace(householdId: string, placeId: string, transaction?: Transaction) {
  const place = await Place.findOne({
    where: { householdId, id: placeId },
    transaction,
    lock: transaction ? transaction.LOCK.SHARE : undefined,
  });
  if (!place) throw notFound('That place');
  return place;
}

/**
 * A place id sent with a product or a batch: one of the household's places, or null. Another household's place
 * (or a made-up id) is refused as a field error, so the form can say so beside the choice.
 */
export async function placeOfHousehold(
  householdId: string,
  placeId: string | null,
  field: string,
  transaction?: Transaction,
): Promise<Place | null> {
  if (placeId === null) return null;
  const place = await Place.findOne({
    where: { householdId, id: placeId },
    transaction,
    lock: transaction ? transaction.LOCK.SHARE : undefined,
  });
  if (!place)
    throw new AppError(400, 'invalid_input', 'That place was not found. Choose one of the household’s places.', {
      [field]: 'Choose a place from the list.',
    });
  return place;
}

export async function createPlace(householdId: string, input: PlaceBody): Promise<PlaceView> {
  const count = await Place.count({ where: { householdId } });
  if (count >= LIMITS.places)
    throw conflict(`A household can name at most ${LIMITS.places} places. Remove one you no longer use first.`);
  const place = await Place.create({ householdId, name: input.name }).catch((error) => sameName(error, input.name));
  return { id: place.id, name: place.name, sealedJars: 0 };
}

export async function renamePlace(householdId: string, placeId: string, input: PlaceBody): Promise<PlaceView> {
  const place = await findPlace(householdId, placeId);
  await place.update({ name: input.name }).catch((error) => sameName(error, input.name));
  return (await listPlaces(householdId)).find((p) => p.id === place.id)!;
}

/** The place the import names, found by name in any case, or added when the household does not have it yet. */
export async function placeByName(householdId: string, name: string, transaction: Transaction): Promise<Place> {
  const [found] = await Place.sequelize!.query<{ id: string }>(
    'SELECT id FROM places WHERE household_id = $1 AND lower(name) = lower($2)',
    { bind: [householdId, name], type: QueryTypes.SELECT, transaction },
  );
  if (found) return (await Place.findByPk(found.id, { transaction }))!;
  return Place.create({ householdId, name }, { transaction });
}

/** Puts a new batch's jars (made by writeBatch in the same transaction) in a place. */
export async function placeNewJars(jars: Jar[], place: Place | null, transaction: Transaction) {
  if (!place || jars.length === 0) return;
  await Jar.update({ placeId: place.id }, { where: { id: jars.map((jar) => jar.id) }, transaction });
  for (const jar of jars) {
    jar.setDataValue('placeId', place.id);
    jar.place = place;
  }
}

/** Moves jars on hand and writes a 'moved' event for each jar that changed place. */
async function moveInTransaction(
  household: Household,
  jars: Jar[],
  to: Place | null,
  userId: string,
  transaction: Transaction,
) {
  const moving = jars.filter((jar) => (jar.placeId ?? null) !== (to?.id ?? null));
  if (moving.length === 0) return 0;
  const fromIds = [...new Set(moving.map((jar) => jar.placeId).filter((id): id is string => id !== null))];
  const names = new Map(
    (await Place.findAll({ where: { id: fromIds }, attributes: ['id', 'name'], transaction })).map((p) => [
      p.id,
      p.name,
    ]),
  );
  await Jar.update({ placeId: to?.id ?? null }, { where: { id: moving.map((jar) => jar.id) }, transaction });
  const today = todayIn(household.timeZone);
  await JarEvent.bulkCreate(
    moving.map((jar) => ({
      householdId: household.id,
      jarId: jar.id,
      batchId: jar.batchId,
      kind: 'moved' as const,
      userId,
      happenedOn: today,
      placeMove: { from: jar.placeId ? (names.get(jar.placeId) ?? null) : null, to: to?.name ?? null },
    })),
    { transaction },
  );
  return moving.length;
}

/** Moves sealed jars to a place, or to no place. Jars already there are left as they are. */
export async function moveJars(
  sequelize: Sequelize,
  household: Household,
  jarIds: string[],
  placeId: string | null,
  userId: string,
): Promise<JarsMoved> {
  const ids = [...new Set(jarIds)];
  return sequelize.transaction(async (transaction) => {
    const to = placeId === null ? null : await findPlace(household.id, placeId, transaction);
    const jars = await Jar.findAll({
      where: { householdId: household.id, id: ids },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (jars.length !== ids.length) throw notFound('A jar in the list');
    const off = jars.find((jar) => !ON_SHELF.includes(jar.state));
    if (off)
      throw conflict(
        `Jar ${off.code} ${NOT_ON_SHELF[off.state] ?? `is ${off.state}`}: only sealed jars move between places. Leave it out of the jars to move.`,
      );
    const moved = await moveInTransaction(household, jars, to, userId, transaction);
    return { moved, placeId: to?.id ?? null, placeName: to?.name ?? null };
  });
}

/**
 * Removes a place. Its jars on hand go where the person chose (another place, or 'none'); without a choice a place
 * that holds jars is refused with what to do. Products that named it as their usual place fall back to none.
 */
export async function removePlace(
  sequelize: Sequelize,
  household: Household,
  placeId: string,
  moveTo: string | undefined,
  userId: string,
) {
  return sequelize.transaction(async (transaction) => {
    const place = await Place.findOne({
      where: { householdId: household.id, id: placeId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!place) throw notFound('That place');
    const jars = await Jar.findAll({
      where: { householdId: household.id, placeId: place.id, state: ON_SHELF },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    let moved = 0;
    if (jars.length > 0) {
      if (moveTo === undefined)
        throw new AppError(409, 'conflict', placeHoldsJarsWords(place.name, jars.length), undefined, {
          sealedJars: jars.length,
        });
      if (moveTo === place.id)
        throw new AppError(400, 'invalid_input', 'Choose another place for its jars, or no place.', {
          moveTo: 'Choose another place.',
        });
      const to = moveTo === 'none' ? null : await findPlace(household.id, moveTo, transaction);
      moved = await moveInTransaction(household, jars, to, userId, transaction);
    }
    await place.destroy({ transaction });
    return { removed: place.id, moved };
  });
}
