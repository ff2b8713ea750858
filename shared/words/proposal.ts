// The words of the week board's meal proposal: why each meal, and the waste it saves.
import { addDays, daysBetween } from '../domain/dates';
import type { ProposalReason } from '../domain/meal-proposal';
import { dateWords, weekdayWords } from './dates';
import { ML_PER_US_TBSP, type UnitSystem } from '../domain/units';
import { count } from './units';

/** "Monday" for a day within a week of the meal, else "Thu, Dec 10". */
function dayWords(isoDate: string, mealDate: string): string {
  return Math.abs(daysBetween(mealDate, isoDate)) <= 6 ? weekdayWords(isoDate) : dateWords(isoDate);
}

/** "Uses the Plum Ketchup opened on Monday before Thursday." A jar turns the day after its use-by. */
export function proposalReasonWords(
  reason: ProposalReason,
  productName: (productId: string) => string,
  mealDate: string,
): string {
  switch (reason.kind) {
    case 'opened-jar':
      return `Uses the ${productName(String(reason.productId))} opened on ${dayWords(reason.openedOn, mealDate)} before ${dayWords(addDays(reason.useBy, 1), mealDate)}.`;
    case 'past-best':
      return `Opens the oldest ${productName(String(reason.productId))}, past its best quality since ${dateWords(addDays(reason.bestBy, 1))}.`;
    case 'nearest-best':
      return `Opens the oldest ${productName(String(reason.productId))}, best quality by ${dateWords(reason.bestBy)}.`;
    case 'variety':
      return 'Nothing on the shelf is pressing here: a change from the week’s other meals.';
  }
}

/** "6 tbsp past their use-by · 2 sealed jars past best quality". */
export function wasteWords(
  waste: { tbspPastUseBy: number; sealedJarsPastBest: number },
  system: UnitSystem = 'us',
): string {
  // Metric in whole mL: 1 US tbsp = 14.78676478125 mL (NIST Handbook 44).
  const amount =
    system === 'metric'
      ? `${Math.round(waste.tbspPastUseBy * ML_PER_US_TBSP)} mL`
      : `${Math.round(waste.tbspPastUseBy * 10) / 10} tbsp`;
  return `${amount} past their use-by · ${count(waste.sealedJarsPastBest, 'sealed jar')} past best quality`;
}
