import { z } from 'zod';
import { LIMITS, limitWords } from './limits';
import {
  INGREDIENT_ROLES,
  INGREDIENT_UNITS,
  JAR_SIZES,
  PROCESSING_METHODS,
  type AltitudeRow,
  type JarSize,
  type Method,
  type RecipeIngredient,
} from '../domain';
import type { UnitSystem } from '../domain/units';
import { headspaceInputValue, headspaceUnitWords } from '../words/units';

export const ingredientInput = z.object({
  name: z
    .string({ error: 'Name the ingredient.' })
    .trim()
    .min(1, 'Name the ingredient.')
    .max(LIMITS.length.ingredientName, `Use at most ${LIMITS.length.ingredientName} characters.`),
  amount: z
    .number({ error: 'Enter the amount as a number.' })
    .positive('Enter an amount above 0.')
    .max(LIMITS.ingredientAmount, 'That amount is too large.'),
  unit: z.enum(INGREDIENT_UNITS, { error: 'Choose a unit.' }),
  role: z.enum(INGREDIENT_ROLES, { error: 'Choose the ingredient’s role.' }),
});

const minutes = z
  .number({ error: 'Enter minutes as a number.' })
  .int('Use whole minutes.')
  .min(0, 'Use 0 or more minutes.')
  .max(LIMITS.processingMinutes, `Use at most ${LIMITS.processingMinutes} minutes.`);

/**
 * Headspace arrives in inches (the form converts what was typed); the refusals speak the household's units, since
 * that is what the person typed: "Use at most 50.8 mm." (NIST SP 811: 1 in = 25.4 mm exactly).
 */
function headspaceField(system: UnitSystem) {
  const unit = headspaceUnitWords(system);
  return z
    .number({ error: `Enter the headspace in ${unit}.` })
    .min(0, `Use 0 or more ${unit}.`)
    .max(LIMITS.headspaceInches, `Use at most ${headspaceInputValue(LIMITS.headspaceInches, system)} ${unit}.`);
}

const fields = {
  productId: z.uuid({ error: 'Choose the product this recipe makes.' }),
  name: z
    .string({ error: 'Name the recipe.' })
    .trim()
    .min(1, 'Name the recipe.')
    .max(LIMITS.length.recipeName, `Use at most ${LIMITS.length.recipeName} characters.`),
  yieldJars: z
    .number({ error: 'Enter the jars the tested recipe makes.' })
    .int('Use a whole number of jars.')
    .min(1, 'A recipe makes at least 1 jar.')
    .max(LIMITS.recipeYieldJars, `Use at most ${LIMITS.recipeYieldJars} jars.`),
  yieldJarSize: z.enum(JAR_SIZES, { error: 'Choose the jar size of the tested yield.' }),
  ingredients: z
    .array(ingredientInput)
    .min(1, 'Add at least one ingredient.')
    .max(LIMITS.ingredientsPerRecipe, `Use at most ${LIMITS.ingredientsPerRecipe} ingredients.`),
  /** Acid strength of the vinegar or juice, in percent (5 for the usual vinegar). */
  acidPercent: z
    .number({ error: 'Enter the acid strength as a number.' })
    .min(0, 'Use 0 or more.')
    .max(100, 'Use at most 100.')
    .nullable(),
  ph: z
    .number({ error: 'Enter the pH as a number.' })
    .min(0, 'pH runs 0 to 14.')
    .max(14, 'pH runs 0 to 14.')
    .nullable(),
  acidified: z.boolean({ error: 'Say whether the recipe is acid or acidified.' }),
  method: z.enum(PROCESSING_METHODS, { error: 'Choose the canner the recipe was tested for.' }),
  baseMinutes: z
    .partialRecord(z.enum(JAR_SIZES, { error: 'That is not a jar size.' }), minutes)
    .refine((times) => Object.keys(times).length > 0, 'Enter the tested minutes for at least one jar size.'),
  altitudeTable: z
    .array(z.object({ upToFt: z.number().int().min(0).max(LIMITS.altitudeFt.max), addMinutes: minutes }))
    .max(LIMITS.altitudeRows)
    .nullable(),
  headspaceInches: headspaceField('us'),
  steps: z.string().max(LIMITS.length.steps, `Use at most ${limitWords(LIMITS.length.steps)} characters.`),
  source: z.string().max(LIMITS.length.source, `Use at most ${LIMITS.length.source} characters.`),
};

const required = {
  productId: true,
  name: true,
  yieldJars: true,
  yieldJarSize: true,
  ingredients: true,
  method: true,
  baseMinutes: true,
  headspaceInches: true,
} as const;
export const recipeCreate = z.object(fields).partial().required(required).strict();
export type RecipeCreate = z.infer<typeof recipeCreate>;
export const recipePatch = z.object(fields).partial().strict();
export type RecipePatch = z.infer<typeof recipePatch>;

const metricFields = { ...fields, headspaceInches: headspaceField('metric') };
const recipeShapes = {
  us: { create: recipeCreate, patch: recipePatch },
  metric: {
    create: z.object(metricFields).partial().required(required).strict(),
    patch: z.object(metricFields).partial().strict(),
  },
} as const;

/** The recipe shapes whose refusals speak the household's units (headspace in inches or mm). */
export const recipeShapesIn = (system: UnitSystem) => recipeShapes[system];

export interface RecipeView {
  id: string;
  productId: string;
  productName: string;
  name: string;
  yieldJars: number;
  yieldJarSize: JarSize;
  ingredients: RecipeIngredient[];
  acidPercent: number | null;
  ph: number | null;
  acidified: boolean;
  method: Method;
  baseMinutes: Partial<Record<JarSize, number>>;
  altitudeTable: AltitudeRow[] | null;
  headspaceInches: number;
  steps: string;
  source: string;
}
