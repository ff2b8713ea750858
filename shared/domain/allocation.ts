// The week's allocation: which jar serves each planned portion, which jars get opened, and what to warn about.
import { requireIsoDate } from './dates';
import { compareIds, requireId, type Id } from './ids';
import { JAR_STATES, useBy, type JarState } from './shelf-life';
import { requireList, requireNonNegative, requireOneOf, requireRecord, requireWholeNumber } from './validate';

export interface AllocationJar {
  id: Id;
  productId: Id;
  state: 'sealed' | 'opened';
  capacityTbsp: number;
  remainingTbsp: number;
  bestBy: string;
  openedOn?: string;
  useWithinDays: number;
}

export interface PlannedPortion {
  id: Id;
  date: string;
  productId: Id;
  tbsp: number;
}

export interface PortionAssignment {
  portionId: Id;
  /** null for the part of a portion the shelf cannot cover. */
  jarId: Id | null;
  tbsp: number;
}

export interface JarOpening {
  jarId: Id;
  date: string;
}

export type AllocationWarning =
  | { kind: 'short'; productId: Id; date: string; tbsp: number; portionId: Id }
  | { kind: 'will-expire'; productId: Id; jarId: Id; date: string; tbsp: number };

export interface WeekAllocation {
  assignments: PortionAssignment[];
  openings: JarOpening[];
  warnings: AllocationWarning[];
}

export interface WeekAllocationInput {
  today: string;
  jars: AllocationJar[];
  portions: PlannedPortion[];
}

// Below this a portion counts as served: it absorbs floating-point crumbs, not food.
const CRUMB_TBSP = 1e-9;

interface JarOnShelf {
  id: Id;
  productId: Id;
  state: JarState;
  remainingTbsp: number;
  bestBy: string;
  useWithinDays: number;
  useBy: string | null;
}

function readJar(jar: AllocationJar, index: number): JarOnShelf {
  const label = `jars[${index}]`;
  requireRecord(jar, label);
  const state = requireOneOf(jar.state, JAR_STATES, `${label}.state`);
  const capacityTbsp = requireNonNegative(jar.capacityTbsp, `${label}.capacityTbsp`);
  const remainingTbsp = requireNonNegative(jar.remainingTbsp, `${label}.remainingTbsp`);
  if (remainingTbsp > capacityTbsp) {
    throw new RangeError(`${label}.remainingTbsp (${remainingTbsp}) is more than the jar holds (${capacityTbsp})`);
  }
  const useWithinDays = requireWholeNumber(jar.useWithinDays, `${label}.useWithinDays`);
  if (state === 'opened' && jar.openedOn === undefined) {
    throw new RangeError(`${label} is opened but has no openedOn date`);
  }
  return {
    id: requireId(jar.id, `${label}.id`),
    productId: requireId(jar.productId, `${label}.productId`),
    state,
    remainingTbsp,
    bestBy: requireIsoDate(jar.bestBy, `${label}.bestBy`),
    useWithinDays,
    useBy: state === 'opened' ? useBy(requireIsoDate(jar.openedOn, `${label}.openedOn`), useWithinDays) : null,
  };
}

function readPortion(portion: PlannedPortion, index: number): PlannedPortion {
  const label = `portions[${index}]`;
  requireRecord(portion, label);
  return {
    id: requireId(portion.id, `${label}.id`),
    date: requireIsoDate(portion.date, `${label}.date`),
    productId: requireId(portion.productId, `${label}.productId`),
    tbsp: requireNonNegative(portion.tbsp, `${label}.tbsp`),
  };
}

/** ISO dates sort as text; ties go to the lower id so the plan never depends on input order. */
function byDateThenId(dateA: string, idA: Id, dateB: string, idB: Id): number {
  return dateA < dateB ? -1 : dateA > dateB ? 1 : compareIds(idA, idB);
}

function requireUniqueIds(records: { id: Id }[], label: string): void {
  const seen = new Set<Id>();
  for (const { id } of records) {
    if (seen.has(id)) throw new RangeError(`${label} id ${id} appears more than once`);
    seen.add(id);
  }
}

/** Opened jars still good on `date`, earliest use-by first: they must be finished before they turn. */
function openedJarsFor(shelf: JarOnShelf[], productId: Id, date: string): JarOnShelf[] {
  return shelf
    .filter(
      (jar) => jar.state === 'opened' && jar.productId === productId && jar.useBy! >= date && jar.remainingTbsp > 0,
    )
    .sort((a, b) => byDateThenId(a.useBy!, a.id, b.useBy!, b.id));
}

/** Sealed jars, oldest best-by first whether or not it has passed: the oldest is eaten first. */
function sealedJarsFor(shelf: JarOnShelf[], productId: Id): JarOnShelf[] {
  return shelf
    .filter((jar) => jar.state === 'sealed' && jar.productId === productId && jar.remainingTbsp > 0)
    .sort((a, b) => byDateThenId(a.bestBy, a.id, b.bestBy, b.id));
}

export function allocateWeek(input: WeekAllocationInput): WeekAllocation {
  requireRecord(input, 'week allocation input');
  const today = requireIsoDate(input.today, 'today');
  const shelf = requireList<AllocationJar>(input.jars, 'jars').map(readJar);
  const allPortions = requireList<PlannedPortion>(input.portions, 'portions').map(readPortion);
  requireUniqueIds(shelf, 'jar');
  requireUniqueIds(allPortions, 'portion');

  const portions = allPortions
    .filter((portion) => portion.date >= today)
    .sort((a, b) => byDateThenId(a.date, a.id, b.date, b.id));

  const assignments: PortionAssignment[] = [];
  const openings: JarOpening[] = [];
  const warnings: AllocationWarning[] = [];

  for (const portion of portions) {
    let needed = portion.tbsp;
    const draw = (jar: JarOnShelf) => {
      const tbsp = Math.min(needed, jar.remainingTbsp);
      jar.remainingTbsp -= tbsp;
      needed -= tbsp;
      assignments.push({ portionId: portion.id, jarId: jar.id, tbsp });
    };
    for (const jar of openedJarsFor(shelf, portion.productId, portion.date)) {
      if (needed <= CRUMB_TBSP) break;
      draw(jar);
    }
    for (const jar of sealedJarsFor(shelf, portion.productId)) {
      if (needed <= CRUMB_TBSP) break;
      jar.state = 'opened';
      jar.useBy = useBy(portion.date, jar.useWithinDays);
      openings.push({ jarId: jar.id, date: portion.date });
      draw(jar);
    }
    if (needed > CRUMB_TBSP) {
      assignments.push({ portionId: portion.id, jarId: null, tbsp: needed });
      warnings.push({
        kind: 'short',
        productId: portion.productId,
        date: portion.date,
        tbsp: needed,
        portionId: portion.id,
      });
    }
  }

  const lastPlannedDate = portions.at(-1)?.date;
  if (lastPlannedDate !== undefined) {
    // A jar is never drawn after its use-by, so what it holds now is what is left after that day's portions.
    const expiring = shelf
      .filter(
        (jar) =>
          jar.state === 'opened' && jar.useBy! >= today && jar.useBy! <= lastPlannedDate && jar.remainingTbsp > 0,
      )
      .sort((a, b) => byDateThenId(a.useBy!, a.id, b.useBy!, b.id));
    for (const jar of expiring) {
      warnings.push({
        kind: 'will-expire',
        productId: jar.productId,
        jarId: jar.id,
        date: jar.useBy!,
        tbsp: jar.remainingTbsp,
      });
    }
  }

  return { assignments, openings, warnings };
}
