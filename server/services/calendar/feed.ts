// A household's calendar in iCalendar (RFC 5545): the planned meals at the household's meal times, the use-by
// dates of opened jars, the seal checks of batches just out of the canner, and the to-dos with a due date. Times carry the household's time zone (TZID with its
// VTIMEZONE), so they stay right across daylight-saving changes. Every event's UID and DTSTAMP come from the
// stored row, so the same data gives the same text and calendar apps polling the address get 304s.
import { TZDate } from '@date-fns/tz';
import ical, { ICalCalendarMethod } from 'ical-generator';
import { Op } from 'sequelize';
import { tzlib_get_ical_block } from 'timezones-ical-library';
import { addDays, sealCheckFrom } from '../../../shared/domain';
import { CANNING_CAUTION_SENTENCE, SLOT_NAMES, USE_BY_CAUTION_SENTENCE, sealCheckTitle } from '../../../shared/words';
import { Batch, BatchProcessing, Household, Jar, Pairing, PlanEntry, Product, Todo } from '../../db/models';
import { clock, todayIn } from '../clock';
import { paths } from '../../../shared/paths';

/** Planned meals from a week back to six weeks ahead; calendar apps keep what they fetched before. */
const MEALS_FROM_DAYS = -7;
const MEALS_TO_DAYS = 42;
/** A meal is placed as a 45-minute event at its slot's time. */
const MEAL_MINUTES = 45;
/** A seal check is a 15-minute event from the time the jars have cooled; checks are offered for a week. */
const SEAL_CHECK_MINUTES = 15;
const SEAL_CHECKS_FROM_DAYS = 7;

/** The instant `isoDate` at `clock` ("18:30") in `timeZone`, as a date that formats itself in that zone. */
export function zonedInstant(isoDate: string, clock: string, timeZone: string): TZDate {
  const [y, m, d] = isoDate.split('-').map(Number);
  const [hh, mm] = clock.split(':').map(Number);
  return new TZDate(y, m - 1, d, hh, mm, 0, timeZone);
}

function allDay(isoDate: string, timeZone: string): TZDate {
  return zonedInstant(isoDate, '00:00', timeZone);
}

/** The UID domain: fixed, so a meal keeps its UID whatever address serves the feed. */
const uid = (kind: string, id: string) => `${kind}-${id}@larderly.calendar`;

export async function householdCalendar(household: Household, publicOrigin: string): Promise<string> {
  const zone = household.timeZone;
  const times = household.mealTimes;
  const today = todayIn(zone);
  const [entries, jars, todos, sealChecks] = await Promise.all([
    PlanEntry.findAll({
      where: {
        householdId: household.id,
        date: { [Op.between]: [addDays(today, MEALS_FROM_DAYS), addDays(today, MEALS_TO_DAYS)] },
      },
      include: [{ model: Pairing, as: 'pairings', include: [{ model: Product, as: 'product', attributes: ['name'] }] }],
      order: [
        ['date', 'ASC'],
        ['slot', 'ASC'],
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Jar.findAll({
      where: { householdId: household.id, state: 'opened', useBy: { [Op.ne]: null } },
      include: [{ model: Product, as: 'product', attributes: ['name'] }],
      order: [
        ['useBy', 'ASC'],
        ['code', 'ASC'],
      ],
    }),
    Todo.findAll({
      where: { householdId: household.id, done: false, dueOn: { [Op.ne]: null } },
      order: [
        ['dueOn', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    sealChecksToDo(household.id),
  ]);

  const calendar = ical({
    name: `Larderly: ${household.name}`,
    description: 'Planned meals, use-by dates of opened jars, seal checks and to-dos with a due date.',
    prodId: { company: 'Larderly', product: 'household-calendar', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
    timezone: { name: zone, generator: (tz) => (tzlib_get_ical_block(tz) as string[])[0] },
    ttl: 60 * 60,
  });

  for (const entry of entries) {
    const start = zonedInstant(entry.date, times[entry.slot], zone);
    const jars = (entry.pairings ?? [])
      .map((p) => (p as Pairing & { product?: Product }).product?.name)
      .filter(Boolean);
    calendar.createEvent({
      id: uid('meal', entry.id),
      stamp: entry.updatedAt,
      start,
      end: new TZDate(start.getTime() + MEAL_MINUTES * 60_000, zone),
      timezone: zone,
      summary: `${SLOT_NAMES[entry.slot]}: ${entry.title}`,
      description: jars.length > 0 ? `With ${jars.join(', ')}.` : undefined,
      // The week screen opens the week holding any date given as its start.
      url: `${publicOrigin}${paths.week(household.id, entry.date)}`,
    });
  }
  for (const jar of jars) {
    const product = (jar as Jar & { product?: Product }).product;
    calendar.createEvent({
      id: uid('use-by', jar.id),
      stamp: jar.updatedAt,
      start: allDay(jar.useBy!, zone),
      allDay: true,
      timezone: zone,
      summary: `Use by: ${product?.name ?? 'an opened jar'} (jar ${jar.code})`,
      description: USE_BY_CAUTION_SENTENCE,
      url: `${publicOrigin}${paths.jar(jar.code)}`,
    });
  }
  for (const check of sealChecks) {
    const start = new TZDate(sealCheckFrom(check.processing.processedAt).getTime(), zone);
    calendar.createEvent({
      id: uid('seal-check', check.processing.id),
      stamp: check.processing.updatedAt,
      start,
      end: new TZDate(start.getTime() + SEAL_CHECK_MINUTES * 60_000, zone),
      timezone: zone,
      summary: sealCheckTitle(check.productName),
      description: `${check.jars === 1 ? '1 jar' : `${check.jars} jars`} still to check. ${CANNING_CAUTION_SENTENCE}`,
      url: `${publicOrigin}${paths.batch(household.id, check.processing.batchId)}`,
    });
  }
  for (const todo of todos) {
    calendar.createEvent({
      id: uid('todo', todo.id),
      stamp: todo.updatedAt,
      start: allDay(todo.dueOn!, zone),
      allDay: true,
      timezone: zone,
      summary: `To do: ${todo.title}`,
      description: todo.notes || undefined,
      url: `${publicOrigin}${paths.todo(household.id, todo.id)}`,
    });
  }
  return calendar.toString();
}

/** The processings of the last week whose jars still wait for their seal check, with the product's name. */
async function sealChecksToDo(householdId: string) {
  const processings = await BatchProcessing.findAll({
    where: {
      householdId,
      processedAt: { [Op.gte]: new Date(clock.now().getTime() - SEAL_CHECKS_FROM_DAYS * 86_400_000) },
    },
    order: [
      ['processedAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  if (processings.length === 0) return [];
  const ids = processings.map((p) => p.id);
  const [waiting, batches] = await Promise.all([
    Jar.findAll({
      attributes: ['processingId'],
      where: { householdId, processingId: ids, state: 'sealed', seal: 'to-check' },
    }),
    Batch.findAll({
      where: { householdId, id: processings.map((p) => p.batchId) },
      include: [{ model: Product, as: 'product', attributes: ['name'] }],
    }),
  ]);
  const names = new Map(batches.map((b) => [b.id, (b as Batch & { product?: Product }).product?.name ?? 'batch']));
  return processings.flatMap((processing) => {
    const jars = waiting.filter((j) => j.processingId === processing.id).length;
    return jars > 0 ? [{ processing, jars, productName: names.get(processing.batchId)! }] : [];
  });
}
