import { z } from 'zod';
import { LIMITS } from './limits';
import { PROCESSING_METHODS, type Canner, type Method } from '../domain';
import { UNIT_SYSTEMS, type UnitSystem } from '../domain/units';
import { ROLES, type Role } from '../roles';
import { isTimeZone } from '../time-zones';
import { householdName } from './auth';
import { altitudeWords } from '../words/units';

export { UNIT_SYSTEMS, type UnitSystem };

const cannerCapacity = z
  .number({ error: 'Enter how many jars the canner holds, as a number.' })
  .int('Use a whole number of jars.')
  .min(1, 'A canner holds at least 1 jar.')
  .max(LIMITS.cannerCapacityJars, `Use at most ${LIMITS.cannerCapacityJars} jars.`);

export const canner = z
  .object({
    method: z.enum(PROCESSING_METHODS, { error: 'Choose what kind of canner it is.' }),
    capacityJars: cannerCapacity,
  })
  .strict();

/**
 * The altitude as the client sends it: whole feet, converted from what the person typed; the refusals name the field
 * and its limits in the household's units ("above 6,096 m" for metric), since that is what the person typed.
 */
function altitudeField(system: UnitSystem) {
  const unit = system === 'metric' ? 'meters' : 'feet';
  return z
    .number({ error: `Enter the altitude in ${unit} as a number.` })
    .int(`Enter the altitude in whole ${unit}.`)
    .min(LIMITS.altitudeFt.min, `The altitude cannot be below ${altitudeWords(LIMITS.altitudeFt.min, system)}.`)
    .max(LIMITS.altitudeFt.max, `The altitude cannot be above ${altitudeWords(LIMITS.altitudeFt.max, system)}.`);
}

/** The household settings a keeper changes, with the refusals worded in the given unit system. */
export const householdPatchFor = (system: UnitSystem) =>
  z
    .object({
      name: householdName.optional(),
      altitudeFt: altitudeField(system).optional(),
      unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose US customary or metric units.' }).optional(),
      timeZone: z.string().max(64).refine(isTimeZone, 'Choose a time zone such as America/Denver.').optional(),
      bestQualityMonths: z
        .number()
        .int('Use whole months.')
        .min(1, 'Use at least 1 month.')
        .max(LIMITS.bestQualityMonths, `Use at most ${LIMITS.bestQualityMonths} months.`)
        .optional(),
      weekStartsOn: z.number().int().min(0, 'Choose a day of the week.').max(6, 'Choose a day of the week.').optional(),
      /** The jars a load of the default canner (the first-run questions ask for one number). */
      cannerCapacityJars: cannerCapacity.optional(),
      defaultMethod: z.enum(PROCESSING_METHODS, { error: 'Choose a processing method.' }).optional(),
      canners: z
        .array(canner)
        .min(1, 'Keep at least one canner: batch plans count their loads by it.')
        .max(PROCESSING_METHODS.length, `List each kind of canner once (at most ${PROCESSING_METHODS.length}).`)
        .refine(
          (list) => new Set(list.map((c) => c.method)).size === list.length,
          'List each kind of canner once; give it the jars its rack holds.',
        )
        .optional(),
    })
    .strict()
    .refine((patch) => !(patch.canners && patch.cannerCapacityJars !== undefined), {
      path: ['cannerCapacityJars'],
      message: 'Give the jars a load with each canner, not as one number beside them.',
    })
    .refine(
      (patch) => !patch.canners || !patch.defaultMethod || patch.canners.some((c) => c.method === patch.defaultMethod),
      { path: ['defaultMethod'], message: 'Choose a default canner from the canners listed.' },
    );

const patchesBySystem = { us: householdPatchFor('us'), metric: householdPatchFor('metric') } as const;
export const householdPatch = patchesBySystem.us;

/**
 * The patch schema for a household of this unit system; a patch that changes the units at the same time is
 * answered in the units it chooses (the form converts the altitude with them).
 */
export function householdPatchIn(current: UnitSystem, body: unknown): typeof householdPatch {
  const chosen = (body as { unitSystem?: unknown } | null)?.unitSystem;
  const system = (UNIT_SYSTEMS as readonly unknown[]).includes(chosen) ? (chosen as UnitSystem) : current;
  return patchesBySystem[system];
}

export type HouseholdPatch = z.infer<typeof householdPatch>;

export const memberPatch = z.object({ role: z.enum(ROLES, { error: 'Choose keeper, cook or helper.' }) }).strict();

export interface HouseholdView {
  id: string;
  name: string;
  altitudeFt: number;
  unitSystem: UnitSystem;
  timeZone: string;
  bestQualityMonths: number;
  weekStartsOn: number;
  /** The jars a load of the default canner. */
  cannerCapacityJars: number;
  canners: Canner[];
  defaultMethod: Method;
  /** False until a keeper has confirmed the altitude: until then no processing plan is shown. */
  altitudeConfirmed: boolean;
  role: Role;
}

export interface MemberView {
  userId: string;
  name: string;
  email: string;
  role: Role;
}
