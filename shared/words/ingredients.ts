// The words for a recipe's ingredient units and roles: the stored values stay short codes, a person reads these.
import type { IngredientRole } from '../domain/scaling';
import type { IngredientUnit } from '../domain/units';

/** Each unit as a choice in a list, spelled out; US customary first, as the recipe form lists them. */
export const INGREDIENT_UNIT_NAMES: Record<IngredientUnit, string> = {
  tsp: 'teaspoons',
  tbsp: 'tablespoons',
  'fl-oz': 'fluid ounces',
  cup: 'cups',
  pint: 'pints',
  quart: 'quarts',
  gallon: 'gallons',
  ml: 'milliliters',
  l: 'liters',
  lb: 'pounds',
  oz: 'ounces (weight)',
  g: 'grams',
  kg: 'kilograms',
  each: 'each (whole items)',
};

/** What each role means for scaling, as the recipe form and the recipe card say it. */
export const INGREDIENT_ROLE_NAMES: Record<IngredientRole, string> = {
  produce: 'Produce (fruit, vegetables)',
  acid: 'Acid (vinegar, lemon juice)',
  sweetener: 'Sweetener (sugar, honey)',
  spice: 'Spice or seasoning',
  other: 'Other',
};
