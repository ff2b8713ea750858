// The processing plan: minutes or pressure for a jar size at an altitude, or a refusal with its reasons.
import { afterProcessingSteps, cautionsFor, US_PLAN_QUANTITIES, type PlanQuantities } from './cautions';
import {
  BOILING_WATER_ALTITUDE_TABLE,
  HIGHEST_TESTED_ALTITUDE_FT,
  PRESSURE_TABLE,
  PROCESSING_METHODS,
  isPressureMethod,
  rowForAltitude,
  type AltitudeRow,
  type Method,
} from './processing-tables';
import { JAR_SIZES, type JarSize } from './units';
import {
  requireBoolean,
  requireList,
  requireNonNegative,
  requireNumber,
  requireOneOf,
  requirePh,
  requireRecord,
} from './validate';

/** US FDA, 21 CFR Part 114: a food is acid or acidified at pH 4.6 or below. */
export const HIGHEST_ACID_PH = 4.6;

/** Willmore et al. (2015), University of Wisconsin-Madison: steam canning is tested up to 45 minutes in all. */
export const STEAM_CANNER_MAX_MINUTES = 45;
export const STEAM_CANNER_LARGEST_JAR: JarSize = 'quart';

export interface ProcessingPlanInput {
  method: Method;
  altitudeFt: number;
  jarSize: JarSize;
  /** The tested time at 0-1,000 ft for this jar size. */
  baseMinutes: number;
  ph?: number;
  acidified?: boolean;
  /** The recipe's own altitude additions; they win over the general table. */
  altitudeTable?: AltitudeRow[];
  /** How the cautions and reasons write their quantities (the household's units); US customary when left out. */
  quantities?: PlanQuantities;
}

export interface ProcessingPlan {
  allowed: boolean;
  minutes: number | null;
  pressurePsi: number | null;
  reasons: string[];
  cautions: string[];
  afterProcessing: string[];
  /** Minutes added for altitude (boiling water and steam); null for pressure or where no row applies. */
  altitudeAddMinutes: number | null;
}

function readAltitudeTable(rows: unknown): AltitudeRow[] {
  return requireList<AltitudeRow>(rows, 'altitudeTable').map((row, index) => ({
    upToFt: requireNonNegative(row?.upToFt, `altitudeTable[${index}].upToFt`),
    addMinutes: requireNonNegative(row?.addMinutes, `altitudeTable[${index}].addMinutes`),
  }));
}

/** A measured pH wins over the recipe's acidified flag; neither given means not known to be acid. */
function acidity(ph: number | undefined, acidified: boolean | undefined): { acid: boolean; why: string } {
  if (ph !== undefined) {
    return { acid: ph <= HIGHEST_ACID_PH, why: `its pH of ${ph} is above ${HIGHEST_ACID_PH}` };
  }
  return { acid: acidified === true, why: 'it is not known to be acid or acidified (pH 4.6 or below)' };
}

export function processingPlan(input: ProcessingPlanInput): ProcessingPlan {
  requireRecord(input, 'processing plan input');
  const method = requireOneOf(input.method, PROCESSING_METHODS, 'method');
  const altitudeFt = requireNumber(input.altitudeFt, 'altitudeFt');
  const jarSize = requireOneOf(input.jarSize, JAR_SIZES, 'jarSize');
  const baseMinutes = requireNonNegative(input.baseMinutes, 'baseMinutes');
  const ph = input.ph === undefined ? undefined : requirePh(input.ph);
  const acidified = input.acidified === undefined ? undefined : requireBoolean(input.acidified, 'acidified');
  const recipeTable = input.altitudeTable === undefined ? undefined : readAltitudeTable(input.altitudeTable);
  const q = input.quantities ?? US_PLAN_QUANTITIES;
  const feet = (value: number) => q.altitude(value);

  const reasons: string[] = [];
  if (altitudeFt > HIGHEST_TESTED_ALTITUDE_FT) {
    reasons.push(
      `No tested processing adjustment is published above ${feet(HIGHEST_TESTED_ALTITUDE_FT)}; ask your local extension service.`,
    );
  }

  const plan = { cautions: cautionsFor(method, q), afterProcessing: afterProcessingSteps(method) };
  if (isPressureMethod(method)) {
    const row = rowForAltitude(PRESSURE_TABLE, altitudeFt);
    const pressurePsi = row ? (method === 'pressure-dial' ? row.dialPsi : row.weightedPsi) : null;
    return {
      allowed: reasons.length === 0,
      minutes: baseMinutes,
      pressurePsi,
      reasons,
      altitudeAddMinutes: null,
      ...plan,
    };
  }

  const methodName = method === 'boiling-water' ? 'A boiling-water canner' : 'An atmospheric steam canner';
  const { acid, why } = acidity(ph, acidified);
  if (!acid) {
    reasons.push(
      `${methodName} is only for acid foods, and ${why}. Use a pressure canner with a tested low-acid recipe.`,
    );
  }

  const row = rowForAltitude(recipeTable ?? BOILING_WATER_ALTITUDE_TABLE, altitudeFt);
  if (!row && recipeTable && altitudeFt <= HIGHEST_TESTED_ALTITUDE_FT) {
    const highest = Math.max(0, ...recipeTable.map((entry) => entry.upToFt));
    reasons.push(
      `The recipe's altitude table stops at ${feet(highest)} and has no tested time for ${feet(altitudeFt)}.`,
    );
  }
  const minutes = row ? baseMinutes + row.addMinutes : null;

  if (method === 'atmospheric-steam') {
    if (minutes !== null && minutes > STEAM_CANNER_MAX_MINUTES) {
      reasons.push(
        `An atmospheric steam canner is tested only for processes up to ${STEAM_CANNER_MAX_MINUTES} minutes in all; this one takes ${minutes}. Use a boiling-water canner.`,
      );
    }
    if (JAR_SIZES.indexOf(jarSize) > JAR_SIZES.indexOf(STEAM_CANNER_LARGEST_JAR)) {
      reasons.push(
        `An atmospheric steam canner is tested only with jars up to a ${q.jarSize(STEAM_CANNER_LARGEST_JAR)}; a ${q.jarSize(jarSize)} jar is bigger.`,
      );
    }
  }

  return {
    allowed: reasons.length === 0,
    minutes,
    pressurePsi: null,
    reasons,
    altitudeAddMinutes: row ? row.addMinutes : null,
    ...plan,
  };
}
