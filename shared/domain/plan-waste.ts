// What a plan leaves to waste by a given day: food in opened jars past their use-by, sealed jars past best quality.
import { allocateWeek, type AllocationJar, type PlannedPortion, type WeekAllocation } from './allocation';
import { daysBetween, requireIsoDate } from './dates';
import type { Id } from './ids';
import { useBy } from './shelf-life';
import { requireList, requireRecord } from './validate';

// Below this a jar counts as empty: floating-point crumbs, not food.
const CRUMB_TBSP = 1e-9;

export interface PlanWaste {
  /** tablespoons left in opened jars whose use-by falls from today to `until` */
  tbspPastUseBy: number;
  /** sealed jars the plan leaves unopened whose best quality ends by `until` (or already has) */
  sealedJarsPastBest: number;
  /** each jar behind the two figures */
  jars: WastedJar[];
}

export type WastedJar =
  | { kind: 'use-by'; jarId: Id; productId: Id; date: string; tbsp: number }
  | { kind: 'best-quality'; jarId: Id; productId: Id; date: string };

export interface PlanWasteInput {
  today: string;
  /** the last day the figure looks at, e.g. the week's last day */
  until: string;
  jars: AllocationJar[];
  portions: PlannedPortion[];
}

/** The pieces of one allocation the proposal scores, kept apart so it can score one product at a time. */
export interface AllocationOutcome {
  waste: PlanWaste;
  /** tablespoons the shelf cannot serve */
  shortTbsp: number;
  /** portions the shelf cannot serve in full */
  shortPortions: Set<Id>;
  /** sealed jars the plan opens although their best quality lasts past `until` */
  freshOpenings: number;
  /** how urgently the plan's draws use what must go first: fridge jars near their use-by most, then the oldest sealed jars */
  urgency: number;
  allocation: WeekAllocation;
}

export function allocationOutcome(
  today: string,
  until: string,
  jars: AllocationJar[],
  portions: PlannedPortion[],
): AllocationOutcome {
  const served = portions.filter((p) => p.date <= until);
  const allocation = allocateWeek({ today, jars, portions: served });
  const drawn = new Map<Id, number>();
  const shortPortions = new Set<Id>();
  let shortTbsp = 0;
  for (const a of allocation.assignments) {
    if (a.jarId === null) {
      shortTbsp += a.tbsp;
      shortPortions.add(a.portionId);
    } else drawn.set(a.jarId, (drawn.get(a.jarId) ?? 0) + a.tbsp);
  }
  const openedOn = new Map(allocation.openings.map((o) => [o.jarId, o.date]));
  const jarById = new Map(jars.map((j) => [j.id, j]));
  const wasted: WastedJar[] = [];
  let tbspPastUseBy = 0;
  let freshOpenings = 0;
  for (const jar of jars) {
    const left = jar.remainingTbsp - (drawn.get(jar.id) ?? 0);
    const opened = jar.state === 'opened' ? jar.openedOn! : openedOn.get(jar.id);
    if (opened !== undefined) {
      const lastDay = useBy(opened, jar.useWithinDays);
      if (jar.state === 'sealed' && jar.bestBy > until) freshOpenings += 1;
      if (lastDay >= today && lastDay <= until && left > CRUMB_TBSP) {
        tbspPastUseBy += left;
        wasted.push({ kind: 'use-by', jarId: jar.id, productId: jar.productId, date: lastDay, tbsp: left });
      }
    } else if (jar.bestBy <= until && jar.remainingTbsp > CRUMB_TBSP) {
      wasted.push({ kind: 'best-quality', jarId: jar.id, productId: jar.productId, date: jar.bestBy });
    }
  }
  const dateOf = new Map(served.map((p) => [p.id, p.date]));
  let urgency = 0;
  for (const a of allocation.assignments) {
    if (a.jarId === null) continue;
    const jar = jarById.get(a.jarId)!;
    const date = dateOf.get(a.portionId)!;
    const opened = jar.state === 'opened' ? jar.openedOn! : openedOn.get(jar.id)!;
    // An open jar drawn before its use-by weighs 1 to 2; a sealed jar it opens weighs up to 1, the oldest most.
    urgency +=
      opened < date || jar.state === 'opened'
        ? a.tbsp * (1 + 1 / (1 + Math.max(0, daysBetween(date, useBy(opened, jar.useWithinDays)))))
        : a.tbsp / (1 + Math.max(0, daysBetween(date, jar.bestBy)) / 30);
  }
  const sealedJarsPastBest = wasted.filter((w) => w.kind === 'best-quality').length;
  return {
    waste: { tbspPastUseBy, sealedJarsPastBest, jars: wasted },
    shortTbsp,
    shortPortions,
    freshOpenings,
    urgency,
    allocation,
  };
}

/** The waste of the plan as it stands: what the board shows before and after a proposal. */
export function planWaste(input: PlanWasteInput): PlanWaste {
  requireRecord(input, 'plan waste input');
  const today = requireIsoDate(input.today, 'today');
  const until = requireIsoDate(input.until, 'until');
  if (until < today) throw new RangeError(`until (${until}) must not be before today (${today})`);
  const jars = requireList<AllocationJar>(input.jars, 'jars');
  const portions = requireList<PlannedPortion>(input.portions, 'portions');
  return allocationOutcome(today, until, jars, portions).waste;
}
