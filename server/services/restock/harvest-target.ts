// The day a restock batch should be made by: inside the harvest window, and before the shelf runs out.
import { addDays, DEFAULT_LEAD_DAYS, lastDayOfMonth, monthOf, yearOf } from '../../../shared/domain';
import { dateWords } from '../../../shared/words';

interface HarvestWindow {
  start: string;
  end: string;
}

/** The run of consecutive harvest months (wrapping past December) that holds today, or the next one. */
export function harvestWindow(today: string, harvestMonths: number[]): HarvestWindow | null {
  const months = new Set(harvestMonths);
  if (months.size === 0 || months.size === 12) return null;
  const current = monthOf(today);
  const isHarvest = (step: number) => months.has(((((current - 1 + step) % 12) + 12) % 12) + 1);
  let first = 0;
  while (!isHarvest(first)) first += 1;
  // Inside a run, its start lies back in the past months; every walk stops because some month is not a harvest month.
  if (first === 0) while (isHarvest(first - 1)) first -= 1;
  let last = Math.max(first, 0);
  while (isHarvest(last + 1)) last += 1;
  const monthAt = (step: number) => {
    const index = current - 1 + step;
    return { year: yearOf(today) + Math.floor(index / 12), month: (((index % 12) + 12) % 12) + 1 };
  };
  const from = monthAt(first);
  const to = monthAt(last);
  return { start: `${from.year}-${String(from.month).padStart(2, '0')}-01`, end: lastDayOfMonth(to.year, to.month) };
}

/** The target date and, in words, why. */
export function targetDate(
  today: string,
  harvestMonths: number[],
  runOutOn: string | null,
): { targetOn: string; why: string } {
  const year = yearOf(today);
  const window = harvestWindow(today, harvestMonths);
  const runOut = runOutOn !== null && runOutOn > today ? runOutOn : null;
  if (window === null) {
    if (runOut)
      return { targetOn: addDays(runOut, -1), why: `The day before the shelf runs out (${dateWords(runOut, year)}).` };
    return {
      targetOn: addDays(today, DEFAULT_LEAD_DAYS),
      why: 'Two weeks from today: time to gather the produce and a free afternoon.',
    };
  }
  if (runOut && runOut > window.start && runOut <= window.end) {
    return {
      targetOn: addDays(runOut, -1),
      why: `Before the shelf runs out on ${dateWords(runOut, year)}, while the produce is in season.`,
    };
  }
  if (window.start > today) {
    return {
      targetOn: window.end,
      why: `The produce comes in from ${dateWords(window.start, year)}; make it before the harvest ends on ${dateWords(window.end, year)}.`,
    };
  }
  return { targetOn: window.end, why: `Before the harvest ends on ${dateWords(window.end, year)}.` };
}
