import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  JAR_SIZES,
  LARGE_BATCH_CAUTION,
  MASS_UNITS,
  PECTIN_BATCH_CAUTION,
  VOLUME_UNITS,
  convertVolume,
  scaleRecipe,
  type IngredientUnit,
  type Recipe,
  type RecipeIngredient,
  type ScaleTarget,
  type VolumeUnit,
} from '@shared/domain';

// A household relish of our own; its amounts are inputs, never expected values from outside.
const relish: Recipe = {
  kind: 'relish',
  yield: { jars: 6, jarSize: 'half-pint' },
  ingredients: [
    { name: 'chopped cucumbers', amount: 4, unit: 'cup', role: 'produce' },
    { name: 'chopped onions', amount: 2, unit: 'cup', role: 'produce' },
    { name: 'cider vinegar, 5% acidity', amount: 1.5, unit: 'cup', role: 'acid' },
    { name: 'sugar', amount: 1, unit: 'cup', role: 'sweetener' },
    { name: 'mustard seed', amount: 2, unit: 'tsp', role: 'spice' },
  ],
};

const amountOf = (recipe: { ingredients: { name: string; amount: number }[] }, name: string) =>
  recipe.ingredients.find((ingredient) => ingredient.name === name)!.amount;

describe('scaleRecipe: the factor (jar volumes: common practice)', () => {
  it('6 half-pints to 3 pints is the same batch: factor 1 (a pint is two half-pints)', () => {
    expect(scaleRecipe(relish, { jars: 3, jarSize: 'pint' }).factor).toBe(1);
  });

  it('6 half-pints to 12 half-pints doubles it; to 3 half-pints halves it', () => {
    expect(scaleRecipe(relish, { jars: 12, jarSize: 'half-pint' }).factor).toBe(2);
    expect(scaleRecipe(relish, { jars: 3, jarSize: 'half-pint' }).factor).toBe(0.5);
  });

  it('takes a factor directly', () => {
    const scaled = scaleRecipe(relish, { factor: 1.5 });
    expect(scaled.factor).toBe(1.5);
    expect(amountOf(scaled, 'chopped cucumbers')).toBe(6);
    expect(amountOf(scaled, 'mustard seed')).toBe(3);
  });
});

describe('scaleRecipe: kitchen rounding (worked by hand from the contract)', () => {
  it('rounds every amount to a measure a cook has: 2 tsp x 5/6 = 1.67 tsp becomes 1 2/3 tsp', () => {
    const scaled = scaleRecipe(relish, { jars: 5, jarSize: 'half-pint' });
    const mustard = scaled.ingredients.find((ingredient) => ingredient.name === 'mustard seed')!;
    expect(mustard.exactAmount).toBeCloseTo(10 / 6, 12);
    expect(mustard.amount).toBeCloseTo(5 / 3, 12);
  });

  it('never rounds a positive amount to 0: 1/8 tsp at a quarter batch stays 1/8 tsp', () => {
    const recipe: Recipe = {
      yield: { jars: 8, jarSize: 'half-pint' },
      ingredients: [{ name: 'ground cloves', amount: 0.125, unit: 'tsp', role: 'spice' }],
    };
    expect(scaleRecipe(recipe, { jars: 2, jarSize: 'half-pint' }).ingredients[0].amount).toBe(0.125);
  });

  it('keeps each ingredient in the unit the recipe gives', () => {
    expect(scaleRecipe(relish, { factor: 2 }).ingredients.map((ingredient) => ingredient.unit)).toEqual(
      relish.ingredients.map((ingredient) => ingredient.unit),
    );
  });
});

describe('scaleRecipe: the acid never weakens (never reduce acid: common practice, extension guidance)', () => {
  // Worked by hand: 1 onion x 5/3 = 1.67 rounds to 1 3/4 onions, so the produce grew by 1.75, not 5/3.
  // Acid rounded up from 1.5 x 5/3 = 2.5 cups would stay 2 1/2 cups and fall behind; scaled by 1.75 it is
  // 2 5/8 cups, and the acid-to-produce ratio holds.
  const salsa: Recipe = {
    kind: 'salsa',
    yield: { jars: 6, jarSize: 'half-pint' },
    ingredients: [
      { name: 'paste tomatoes', amount: 3, unit: 'cup', role: 'produce' },
      { name: 'onion', amount: 1, unit: 'each', role: 'produce' },
      { name: 'bottled lime juice', amount: 1.5, unit: 'cup', role: 'acid' },
    ],
  };

  it('scales acid by the largest factor any produce received after rounding, then rounds it up', () => {
    const scaled = scaleRecipe(salsa, { jars: 5, jarSize: 'pint' });
    expect(scaled.factor).toBeCloseTo(5 / 3, 12);
    expect(amountOf(scaled, 'onion')).toBe(1.75);
    expect(scaled.acidFactor).toBe(1.75);
    expect(amountOf(scaled, 'bottled lime juice')).toBe(2.625);
  });

  it('never scales acid by less than the factor, even when all the produce rounded down', () => {
    const scaled = scaleRecipe(salsa, { factor: 1.01 });
    expect(scaled.acidFactor).toBeGreaterThanOrEqual(1.01);
    expect(amountOf(scaled, 'bottled lime juice')).toBeGreaterThanOrEqual(1.5 * 1.01);
  });
});

describe('scaleRecipe: batch cautions (common practice)', () => {
  const jam: Recipe = {
    kind: 'jam',
    yield: { jars: 8, jarSize: 'half-pint' },
    ingredients: [
      { name: 'crushed apricots', amount: 5, unit: 'cup', role: 'produce' },
      { name: 'bottled lemon juice', amount: 0.25, unit: 'cup', role: 'acid' },
      { name: 'powdered pectin', amount: 6, unit: 'tbsp', role: 'other' },
      { name: 'sugar', amount: 7, unit: 'cup', role: 'sweetener' },
    ],
  };

  it('warns against more than one batch of a pectin jam', () => {
    expect(scaleRecipe(jam, { factor: 1 }).cautions).toEqual([]);
    expect(scaleRecipe(jam, { factor: 0.5 }).cautions).toEqual([]);
    expect(scaleRecipe(jam, { factor: 1.5 }).cautions).toEqual([PECTIN_BATCH_CAUTION]);
  });

  it('recognises pectin by the recipe flag where the ingredient name does not say so', () => {
    const renamed: Recipe = {
      ...jam,
      usesPectin: true,
      ingredients: jam.ingredients.filter((i) => !/pectin/.test(i.name)),
    };
    expect(scaleRecipe(renamed, { factor: 2 }).cautions).toEqual([PECTIN_BATCH_CAUTION]);
  });

  it('warns at any factor above 2, but not at exactly 2', () => {
    expect(scaleRecipe(relish, { factor: 2 }).cautions).toEqual([]);
    expect(scaleRecipe(relish, { factor: 2.01 }).cautions).toEqual([LARGE_BATCH_CAUTION]);
    expect(scaleRecipe(jam, { factor: 3 }).cautions).toEqual([PECTIN_BATCH_CAUTION, LARGE_BATCH_CAUTION]);
  });
});

describe('scaleRecipe properties (fast-check)', () => {
  const positiveAmount = fc.double({ min: 0.05, max: 50, noNaN: true });
  const factor = fc.double({ min: 0.1, max: 6, noNaN: true });
  const volumeUnit = fc.constantFrom(...VOLUME_UNITS);
  const anyUnit = fc.constantFrom<IngredientUnit>(...VOLUME_UNITS, ...MASS_UNITS, 'each');
  const ingredient = (role: RecipeIngredient['role'], unit: fc.Arbitrary<IngredientUnit>) =>
    fc.record({ name: fc.constant(role), amount: positiveAmount, unit, role: fc.constant(role) });
  const jarYield = fc.record({ jars: fc.integer({ min: 1, max: 24 }), jarSize: fc.constantFrom(...JAR_SIZES) });
  const target: fc.Arbitrary<ScaleTarget> = fc.oneof(fc.record({ factor }), jarYield);

  const recipeWith = (produceUnit: fc.Arbitrary<IngredientUnit>) =>
    fc
      .tuple(
        jarYield,
        fc.array(ingredient('produce', produceUnit), { minLength: 1, maxLength: 4 }),
        fc.array(ingredient('acid', volumeUnit), { minLength: 1, maxLength: 2 }),
        fc.array(ingredient('spice', anyUnit), { maxLength: 3 }),
      )
      .map(([yieldOf, produce, acid, spices]): Recipe => ({
        yield: yieldOf,
        ingredients: [...produce, ...acid, ...spices],
      }));

  const millilitres = (ingredients: { amount: number; unit: IngredientUnit; role: string }[], role: string) =>
    ingredients
      .filter((ingredient) => ingredient.role === role)
      .reduce((sum, ingredient) => sum + convertVolume(ingredient.amount, ingredient.unit as VolumeUnit, 'ml'), 0);

  it('scaling by a then by b equals scaling by a x b before rounding', () => {
    fc.assert(
      fc.property(recipeWith(anyUnit), factor, factor, (recipe, a, b) => {
        const once = scaleRecipe(recipe, { factor: a });
        const rescaled = scaleRecipe(
          {
            ...recipe,
            ingredients: once.ingredients.map(({ exactAmount, ...rest }) => ({ ...rest, amount: exactAmount })),
          },
          { factor: b },
        );
        const direct = scaleRecipe(recipe, { factor: a * b });
        rescaled.ingredients.forEach((ingredient, index) => {
          const expected = direct.ingredients[index].exactAmount;
          expect(Math.abs(ingredient.exactAmount - expected)).toBeLessThanOrEqual(expected * 1e-12);
        });
      }),
    );
  });

  // A relative 1e-9 allows for floating-point noise in the ratio sums themselves, nothing a cook could measure.
  it('the acid-to-produce ratio in mL never drops after rounding', () => {
    fc.assert(
      fc.property(recipeWith(volumeUnit), target, (recipe, scaleTo) => {
        const scaled = scaleRecipe(recipe, scaleTo);
        const before = millilitres(recipe.ingredients, 'acid') / millilitres(recipe.ingredients, 'produce');
        const after = millilitres(scaled.ingredients, 'acid') / millilitres(scaled.ingredients, 'produce');
        expect(after).toBeGreaterThanOrEqual(before * (1 - 1e-9));
      }),
    );
  });

  it('with produce weighed or counted, every acid grows by at least as much as any produce did', () => {
    fc.assert(
      fc.property(recipeWith(anyUnit), target, (recipe, scaleTo) => {
        const scaled = scaleRecipe(recipe, scaleTo);
        const growth = (role: string) =>
          scaled.ingredients.flatMap((ingredient, index) =>
            ingredient.role === role ? [ingredient.amount / recipe.ingredients[index].amount] : [],
          );
        expect(Math.min(...growth('acid'))).toBeGreaterThanOrEqual(Math.max(...growth('produce')) * (1 - 1e-9));
      }),
    );
  });

  it('never rounds a positive amount to 0', () => {
    fc.assert(
      fc.property(recipeWith(anyUnit), target, (recipe, scaleTo) => {
        for (const ingredient of scaleRecipe(recipe, scaleTo).ingredients) expect(ingredient.amount).toBeGreaterThan(0);
      }),
    );
  });
});

describe('scaleRecipe refuses malformed input with a RangeError', () => {
  const withIngredient = (change: Partial<Record<keyof RecipeIngredient, unknown>>): Recipe =>
    ({ ...relish, ingredients: [{ ...relish.ingredients[0], ...change }] }) as Recipe;

  it.each<[string, Recipe, ScaleTarget, RegExp]>([
    [
      'a negative amount',
      withIngredient({ amount: -1 }),
      { factor: 1 },
      /amount of chopped cucumbers must not be negative/,
    ],
    [
      'a NaN amount',
      withIngredient({ amount: Number.NaN }),
      { factor: 1 },
      /amount of chopped cucumbers must be a finite number/,
    ],
    ['an unknown unit', withIngredient({ unit: 'pinch' }), { factor: 1 }, /unit of chopped cucumbers must be one of/],
    ['an unknown role', withIngredient({ role: 'garnish' }), { factor: 1 }, /role of chopped cucumbers must be one of/],
    [
      'a part jar in the yield',
      { ...relish, yield: { jars: 2.5, jarSize: 'pint' } },
      { factor: 1 },
      /recipe.yield.jars must be a whole number/,
    ],
    [
      'an unknown jar size',
      { ...relish, yield: { jars: 2, jarSize: 'magnum' } } as unknown as Recipe,
      { factor: 1 },
      /jarSize must be one of/,
    ],
    ['a target of 0 jars', relish, { jars: 0, jarSize: 'pint' }, /target.jars must be at least 1/],
    ['a target of a part jar', relish, { jars: 1.5, jarSize: 'pint' }, /target.jars must be a whole number/],
    ['a factor of 0', relish, { factor: 0 }, /factor must be more than 0/],
    ['a NaN factor', relish, { factor: Number.NaN }, /factor must be a finite number/],
  ])('%s', (_, recipe, scaleTo, message) => {
    expect(() => scaleRecipe(recipe, scaleTo)).toThrow(RangeError);
    expect(() => scaleRecipe(recipe, scaleTo)).toThrow(message);
  });
});
