import { z } from 'zod';
import { LIMITS, limitWords } from './limits';
import { JAR_SIZES, PRODUCT_KINDS, type JarSize, type ProductKind } from '../domain';
import { PRODUCT_COLOURS, type ProductColour } from '../words';

export { PRODUCT_COLOURS, type ProductColour };

const fields = {
  name: z
    .string({ error: 'Give the product a name.' })
    .trim()
    .min(1, 'Give the product a name.')
    .max(LIMITS.length.productName, `Use at most ${LIMITS.length.productName} characters.`),
  kind: z.enum(PRODUCT_KINDS, { error: 'Choose the kind of preserve.' }),
  heat: z
    .number({ error: 'Choose a heat from 0 to 5.' })
    .int('Choose a heat from 0 to 5.')
    .min(0, 'Choose a heat from 0 to 5.')
    .max(LIMITS.heat, 'Choose a heat from 0 to 5.'),
  favourite: z.boolean({ error: 'Say whether it is a favourite.' }),
  minJars: z
    .number({ error: 'Enter the fewest jars to keep as a number.' })
    .int('Use a whole number of jars.')
    .min(0, 'Use 0 or more jars.')
    .max(LIMITS.minJars, `Use at most ${LIMITS.minJars} jars.`),
  /** null: the default for the product's kind */
  useWithinDays: z
    .number({ error: 'Enter the days as a number.' })
    .int('Use whole days.')
    .min(1, 'Use at least 1 day.')
    .max(LIMITS.useWithinDays, `Use at most ${LIMITS.useWithinDays} days.`)
    .nullable(),
  harvestMonths: z.array(z.number().int().min(1, 'Months run 1 to 12.').max(12, 'Months run 1 to 12.')).max(12),
  jarSize: z.enum(JAR_SIZES, { error: 'Choose a jar size.' }),
  colour: z.enum(PRODUCT_COLOURS, { error: 'Choose a colour.' }),
  notes: z.string().max(LIMITS.length.notes, `Use at most ${limitWords(LIMITS.length.notes)} characters.`),
  /** Where its batches usually go; null: no usual place. */
  defaultPlaceId: z.uuid({ error: 'Choose a place from the list, or no place.' }).nullable(),
};

export const productCreate = z.object(fields).partial().required({ name: true, kind: true }).strict();
export type ProductCreate = z.infer<typeof productCreate>;
export const productPatch = z.object(fields).partial().strict();
export type ProductPatch = z.infer<typeof productPatch>;

export interface ProductView {
  id: string;
  name: string;
  kind: ProductKind;
  heat: number;
  favourite: boolean;
  minJars: number;
  useWithinDays: number | null;
  /** What an opened jar keeps: the product's own days, or its kind's default. */
  effectiveUseWithinDays: number;
  harvestMonths: number[];
  jarSize: JarSize;
  colour: ProductColour;
  notes: string;
  defaultPlaceId: string | null;
}
