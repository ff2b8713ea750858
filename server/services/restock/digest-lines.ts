import type { UnitSystem } from '../../../shared/domain';
import { jarSizeWords } from '../../../shared/words';
import type { DigestContent } from '../mail/digest-mail';
import { restockFor } from './view';

/** The restock suggestions the weekly digest lists under "Restock suggestions"; none leaves the section out. */
export async function digestRestockLines(
  householdId: string,
  today: string,
  system: UnitSystem = 'us',
): Promise<DigestContent['restock']> {
  const suggestions = await restockFor(householdId, today);
  return suggestions.map((suggestion) => ({
    productName: suggestion.productName,
    reason: `${suggestion.why} ${
      suggestion.openTodoId
        ? 'A batch is already on the to-do list.'
        : `About ${suggestion.suggestedJars} ${jarSizeWords(suggestion.jarSize, system)} jars would last until the next harvest.`
    }`,
  }));
}
