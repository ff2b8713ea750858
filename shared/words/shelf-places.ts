// Shelf places: where a household keeps its jars. The names are the household's own; these are the words around them.
// Imported from shared/words/shelf-places, not the words' index, so the first screen does not load them; Today gets its
// "in the Pantry" from the server, which writes it with placeWords.

/** What the screens call a place, and the no-place choice. */
export const PLACE_WORDS = {
  name: 'Place',
  plural: 'Places',
  none: 'No place',
  noneOnShelf: 'No place named',
  everywhere: 'Every place',
  defaultPlace: 'Usual place',
  defaultPlaceHint: 'Where this product’s jars usually go; a new batch starts there, and you can change it.',
  batchPlace: 'Where the jars go',
  move: 'Move',
  moveTo: 'Move to',
  moved: 'moved',
} as const;

/** A jar's history line for a move. */
export function placeMoveWords(move: { from: string | null; to: string | null }): string {
  return `moved from ${move.from ?? 'no place'} to ${move.to ?? 'no place'}`;
}

/** Why a place with jars cannot simply go, and what to do. */
export function placeHoldsJarsWords(name: string, jars: number): string {
  const these = jars === 1 ? '1 jar' : `${jars} jars`;
  return `${name} still holds ${these}. Choose where ${jars === 1 ? 'it goes' : 'they go'} (another place or no place), then remove it.`;
}

export const PLACE_NAME_TAKEN = (name: string) =>
  `The household already has a place called “${name}”. Choose another name, or use that place.`;

/** The CSV column, as the import help lists it. */
export const PLACE_CSV_HELP =
  'Where the jars are kept, by the place’s name. A place the household does not have yet is added; an empty cell leaves the jars with no place.';

/** "in the Pantry"; a name that starts with its own article ("the cupboard over the stairs", "our loft") keeps it. */
export function placeWords(name: string | null): string {
  if (!name) return 'with no place named';
  return /^(the|my|our|a|an)\s/i.test(name.trim()) ? `in ${name.trim()}` : `in the ${name.trim()}`;
}
