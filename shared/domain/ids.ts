// Record ids as the server stores them (numbers or strings), ordered the same way everywhere.
import { describeValue } from './validate';

export type Id = string | number;

export function requireId(value: unknown, label: string): Id {
  if ((typeof value === 'string' && value !== '') || (typeof value === 'number' && Number.isFinite(value)))
    return value;
  throw new RangeError(`${label} must be a non-empty string or a number; got ${describeValue(value)}`);
}

/** Two numbers compare as numbers (2 before 10); anything else compares as text. */
export function compareIds(a: Id, b: Id): number {
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  const [textA, textB] = [String(a), String(b)];
  return textA < textB ? -1 : textA > textB ? 1 : 0;
}
