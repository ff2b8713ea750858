import { afterAll, beforeAll } from 'vitest';
import { clock } from '../../server/services/clock';

/** Holds the server's clock at one instant for the whole test file, so "today" is a known date. */
export function holdClockAt(instant: string) {
  const realNow = clock.now;
  beforeAll(() => {
    clock.now = () => new Date(instant);
  });
  afterAll(() => {
    clock.now = realNow;
  });
}
