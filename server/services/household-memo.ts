// Parts of an answer that several household reads share (the shelf's jars and history, the restock list), worked out
// once per change of the household instead of once per read: the read cache's rule, for pieces instead of answers.

/**
 * The household's versions as the guard read them with this request (migrations 0085, 0200): `data` moves with
 * every write but the plan's, `plan` with every write to the planned meals, in any process.
 */
export interface HouseholdVersions {
  data: string;
  plan: string;
}

/** The version of a value made from both the household's data and its plan. */
export const bothVersions = (versions: HouseholdVersions) => `${versions.data} ${versions.plan}`;

/**
 * How many households' parts a memo keeps: a part matters between a change and the reads that follow it, and the
 * shelf of a household with years of jars is a few hundred kilobytes of objects, so a few hundred bound the memory.
 */
export const MEMO_HOUSEHOLDS = 256;

/**
 * A per-process store of values worked out from a household's rows, each kept until the version it was made at is
 * no longer the one a request reads. A value made while a write committed holds data at least as new as its version,
 * so no request is answered from rows older than the versions it read. Callers without versions (jobs, writes inside
 * a transaction) work the value out every time. Requests that miss at once share one computation; a failed one is
 * not kept. The read cache (http/read-cache.ts) keeps whole answers in one.
 *
 * The values are shared between requests: freeze what a caller could change in place (see `frozen`).
 */
export function householdMemo<T>(maxEntries = MEMO_HOUSEHOLDS) {
  const entries = new Map<string, { version: string; value: Promise<T> }>();
  return (key: string, version: string | undefined, compute: () => Promise<T>): Promise<T> => {
    if (version === undefined) return compute();
    const held = entries.get(key);
    if (held?.version === version) return held.value;
    const value = compute();
    entries.delete(key);
    entries.set(key, { version, value });
    if (entries.size > maxEntries) entries.delete(entries.keys().next().value!);
    value.catch(() => entries.get(key)?.value === value && entries.delete(key));
    return value;
  };
}

/** A small shared value frozen through and through, its nested objects and arrays too (Dates are left as they are). */
export function deepFrozen<T>(value: T): T {
  if (value && typeof value === 'object' && !(value instanceof Date) && !Object.isFrozen(value)) {
    for (const inner of Object.values(value)) deepFrozen(inner);
    Object.freeze(value);
  }
  return value;
}

/** The arrays of a shared value, frozen: a caller that sorts or pushes in place fails at once instead of changing it. */
export function frozen<T extends object>(value: T): T {
  for (const field of Object.values(value)) if (Array.isArray(field)) Object.freeze(field);
  return Object.freeze(value);
}
