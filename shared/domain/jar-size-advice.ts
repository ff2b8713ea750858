// The jar size a household finishes before an opened jar passes its use-by.
import { JAR_SIZES, jarCapacityTbsp, type JarSize } from './units';
import { requireNonNegative, requireWholeNumber } from './validate';

// Half-gallon jars are tested only for a few very acid juices (from memory), so advice stops at a quart.
const LARGEST_ADVISED_JAR: JarSize = 'quart';

export interface JarSizeAdvice {
  size: JarSize | null;
  cautions: string[];
}

/** The largest jar, a quart at most, whose tablespoons are eaten within `useWithinDays` at `dailyTbsp` a day. */
export function jarSizeAdvice(dailyTbsp: number, useWithinDays: number): JarSizeAdvice {
  const rate = requireNonNegative(dailyTbsp, 'dailyTbsp');
  const days = requireWholeNumber(useWithinDays, 'useWithinDays');
  if (rate === 0) {
    return {
      size: null,
      cautions: ['Nothing is eaten from this product at the moment, so no jar size can be advised yet.'],
    };
  }
  const sizes = JAR_SIZES.slice(0, JAR_SIZES.indexOf(LARGEST_ADVISED_JAR) + 1);
  const size = sizes.filter((candidate) => jarCapacityTbsp(candidate) <= rate * days).at(-1);
  if (size !== undefined) return { size, cautions: [] };
  const smallest = sizes[0];
  const daysToFinish = Math.ceil(jarCapacityTbsp(smallest) / rate);
  return {
    size: smallest,
    cautions: [
      `Even a quarter-pint jar takes about ${daysToFinish} days to finish at this rate, longer than its ${days} days once open: share it, or plan it into more meals.`,
    ],
  };
}
