// Guards that turn malformed input into a RangeError saying what was wrong and what was expected.

export function describeValue(value: unknown): string {
  if (typeof value === 'string') return `'${value}'`;
  if (value === undefined) return 'nothing';
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) return String(value);
  return typeof value;
}

export function requireNumber(value: unknown, label: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${label} must be a finite number; got ${describeValue(value)}`);
  }
  return value;
}

export function requireNonNegative(value: unknown, label: string): number {
  const number = requireNumber(value, label);
  if (number < 0) throw new RangeError(`${label} must not be negative; got ${number}`);
  return number;
}

export function requirePositive(value: unknown, label: string): number {
  const number = requireNumber(value, label);
  if (number <= 0) throw new RangeError(`${label} must be more than 0; got ${number}`);
  return number;
}

export function requireWholeNumber(value: unknown, label: string, minimum = 0): number {
  const number = requireNumber(value, label);
  if (!Number.isInteger(number)) throw new RangeError(`${label} must be a whole number; got ${number}`);
  if (number < minimum) throw new RangeError(`${label} must be at least ${minimum}; got ${number}`);
  return number;
}

export function requireOneOf<T extends string>(value: unknown, allowed: readonly T[], label: string): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new RangeError(`${label} must be one of ${allowed.join(', ')}; got ${describeValue(value)}`);
  }
  return value as T;
}

export function requireBoolean(value: unknown, label: string): boolean {
  if (typeof value !== 'boolean') throw new RangeError(`${label} must be true or false; got ${describeValue(value)}`);
  return value;
}

export function requirePh(value: unknown): number {
  const ph = requireNumber(value, 'ph');
  if (ph < 0 || ph > 14) throw new RangeError(`ph must be between 0 and 14; got ${ph}`);
  return ph;
}

export function requireList<T>(value: unknown, label: string): T[] {
  if (!Array.isArray(value)) throw new RangeError(`${label} must be a list; got ${describeValue(value)}`);
  return value as T[];
}

export function requireRecord<T extends object>(value: unknown, label: string): T {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new RangeError(`${label} must be an object; got ${describeValue(value)}`);
  }
  return value as T;
}
