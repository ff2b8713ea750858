// Which ways a jar leaves the shelf bring its empty jar back to the cupboard. Pure, so every ending shares one rule.

/** How a jar of food ends: eaten to the end, discarded (the jar kept, or not), or given away with its food. */
export type JarEnding = { reason: 'finish' } | { reason: 'discard'; kept: boolean } | { reason: 'given' };

/**
 * How many empty jars come back to stock when a jar ends: one when the household still has the jar, none when it
 * broke, was thrown out or left with the food as a gift. Jars and bands are reused, lids are not (USDA Complete Guide
 * to Home Canning, 2015, Guide 1; NCHFP): a lid never comes back, so this counts jars only.
 */
export function emptyJarsBack(ending: JarEnding): 0 | 1 {
  switch (ending.reason) {
    case 'finish':
      return 1;
    case 'discard':
      return ending.kept ? 1 : 0;
    case 'given':
      return 0;
  }
}
