// Where a jar is kept, in words: the one helper Today needs, kept small because the words' index is in the first screen.
// The rest of the places' words (labels, refusals, the CSV help) are in shared/words/shelf-places, loaded by the screens that use them.

/** "in the Pantry"; a name that starts with its own article ("the cupboard over the stairs", "our loft") keeps it. */
export function placeWords(name: string | null): string {
  if (!name) return 'with no place named';
  return /^(the|my|our|a|an)\s/i.test(name.trim()) ? `in ${name.trim()}` : `in the ${name.trim()}`;
}
