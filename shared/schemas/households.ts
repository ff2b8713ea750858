import { z } from 'zod';
import { LIMITS, limitWords } from './limits';
import { PROCESSING_METHODS, type Method } from '../domain';
import { UNIT_SYSTEMS, type UnitSystem } from '../domain/units';
import { ROLES, type Role } from '../roles';
import { isTimeZone } from '../time-zones';
import { householdName } from './auth';

export { UNIT_SYSTEMS, type UnitSystem };

export const householdPatch = z
  .object({
    name: householdName.optional(),
    altitudeFt: z
      .number({ error: 'Enter the altitude in feet as a number.' })
      .int('Enter the altitude in whole feet.')
      .min(LIMITS.altitudeFt.min, `The altitude cannot be below ${limitWords(LIMITS.altitudeFt.min)} ft.`)
      .max(LIMITS.altitudeFt.max, `The altitude cannot be above ${limitWords(LIMITS.altitudeFt.max)} ft.`)
      .optional(),
    unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose US customary or metric units.' }).optional(),
    timeZone: z.string().max(64).refine(isTimeZone, 'Choose a time zone such as America/Denver.').optional(),
    bestQualityMonths: z
      .number()
      .int('Use whole months.')
      .min(1, 'Use at least 1 month.')
      .max(LIMITS.bestQualityMonths, `Use at most ${LIMITS.bestQualityMonths} months.`)
      .optional(),
    weekStartsOn: z.number().int().min(0, 'Choose a day of the week.').max(6, 'Choose a day of the week.').optional(),
    cannerCapacityJars: z
      .number()
      .int('Use a whole number of jars.')
      .min(1, 'A canner holds at least 1 jar.')
      .max(LIMITS.cannerCapacityJars, `Use at most ${LIMITS.cannerCapacityJars} jars.`)
      .optional(),
    defaultMethod: z.enum(PROCESSING_METHODS, { error: 'Choose a processing method.' }).optional(),
  })
  .strict();
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
  cannerCapacityJars: number;
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
