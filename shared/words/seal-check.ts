// The seal check's words: the batch form's choice, the reminder, Today and the batch page.
import { dateFormatter } from './intl-format';
import { count } from './units';
import { CANNING_CAUTION_PUSH } from './cautions';

/** A sealed jar whose lid has not been checked yet. */
export const SEAL_TO_CHECK_NAME = 'Seal to check';

export const SEALS_CHOICE = {
  'to-check': {
    label: 'Check the seals later',
    hint: 'The jars have just come out of the canner. Leave them to cool; Larderly reminds you when they can be checked.',
  },
  checked: { label: 'Seals checked already', hint: 'Enter how many sealed; those that did not go to the fridge.' },
} as const;

/** How to check a lid (USDA Complete Guide to Home Canning, 2015, "Testing jar seals"; in our own words). */
export const SEAL_CHECK_HOW =
  'Press the middle of each lid: a sealed lid is curved down and does not move. A lid that flexes up and down, or comes off, did not seal.';

export const SEAL_CHECK_SOURCE =
  'USDA Complete Guide to Home Canning (2015); National Center for Home Food Preservation';

/** What to do with a jar that did not seal. */
export const UNSEALED_CHOICES = {
  fridge: 'Into the fridge: use it like an opened jar.',
  reprocess: 'Reprocess within 24 hours of the first processing: a new lid, the full processing time again.',
  tooLate: 'More than 24 hours have passed since the first processing: the fridge is the only safe place for it now.',
} as const;

/** "Wed 3:40 PM" in the household's time zone. */
export function clockWords(at: Date | string, timeZone: string): string {
  return dateFormatter('en-US', { timeZone, weekday: 'short', hour: 'numeric', minute: '2-digit' }).format(
    new Date(at),
  );
}

export function sealCheckTitle(productName: string): string {
  return `Check the seals of the ${productName}`;
}

/** The reminder's words, for push and e-mail. */
export function sealCheckMessage(productName: string, jars: number, reprocessBy: string | null): string {
  const jarsWord = count(jars, 'jar');
  const reprocess = reprocessBy
    ? ` A jar that did not seal goes to the fridge, or is reprocessed with a new lid by ${reprocessBy}.`
    : ' A jar that did not seal goes to the fridge.';
  return `The ${jarsWord} of ${productName} have cooled 12 hours. ${SEAL_CHECK_HOW}${reprocess} ${CANNING_CAUTION_PUSH}`;
}
