// The published processing tables: boiling-water time additions and pressure by altitude.

export const PROCESSING_METHODS = ['boiling-water', 'atmospheric-steam', 'pressure-dial', 'pressure-weighted'] as const;
export type Method = (typeof PROCESSING_METHODS)[number];

export interface AltitudeRow {
  upToFt: number;
  addMinutes: number;
}

export interface PressureRow {
  upToFt: number;
  dialPsi: number;
  weightedPsi: number;
}

/** No tested adjustment is published above this altitude. */
export const HIGHEST_TESTED_ALTITUDE_FT = 10_000;

/** USDA Complete Guide to Home Canning, AIB 539 (2015), Guide 1: minutes added to the 0-1,000 ft boiling-water time. */
export const BOILING_WATER_ALTITUDE_TABLE: readonly AltitudeRow[] = [
  { upToFt: 1_000, addMinutes: 0 },
  { upToFt: 3_000, addMinutes: 5 },
  { upToFt: 6_000, addMinutes: 10 },
  { upToFt: 8_000, addMinutes: 15 },
  { upToFt: 10_000, addMinutes: 20 },
];

/** USDA Complete Guide to Home Canning, AIB 539 (2015), Guide 1: pounds per square inch by altitude and gauge. */
export const PRESSURE_TABLE: readonly PressureRow[] = [
  { upToFt: 1_000, dialPsi: 11, weightedPsi: 10 },
  { upToFt: 2_000, dialPsi: 11, weightedPsi: 15 },
  { upToFt: 4_000, dialPsi: 12, weightedPsi: 15 },
  { upToFt: 6_000, dialPsi: 13, weightedPsi: 15 },
  { upToFt: 8_000, dialPsi: 14, weightedPsi: 15 },
  { upToFt: 10_000, dialPsi: 15, weightedPsi: 15 },
];

/** USDA Guide 1 tables start at 0-1,000 ft, so below sea level reads as sea level. */
export function rowForAltitude<Row extends { upToFt: number }>(rows: readonly Row[], altitudeFt: number): Row | null {
  const altitude = Math.max(0, altitudeFt);
  return [...rows].sort((a, b) => a.upToFt - b.upToFt).find((row) => altitude <= row.upToFt) ?? null;
}

export function isPressureMethod(method: Method): boolean {
  return method === 'pressure-dial' || method === 'pressure-weighted';
}
