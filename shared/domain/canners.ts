// A household's canners: each is for one processing method and holds its own number of jars a load.
import type { Method } from './processing-tables';

export interface Canner {
  method: Method;
  capacityJars: number;
}

/** The canner a batch processed by this method goes into: the household's own for it, else none. */
export function cannerFor(canners: readonly Canner[], method: Method): Canner | null {
  return canners.find((canner) => canner.method === method) ?? null;
}

/** Jars split into canner loads, full loads first: 10 jars in a 7-jar canner are 7 + 3. */
export function cannerLoads(jars: number, capacity: number): number[] {
  if (!(capacity >= 1)) throw new RangeError(`capacity must be at least 1 jar; got ${capacity}`);
  const loads = Array.from({ length: Math.floor(jars / capacity) }, () => capacity);
  return jars % capacity ? [...loads, jars % capacity] : loads;
}
