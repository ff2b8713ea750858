// Why a paired product may not suit someone at the table: too hot for them, or against their diet.
import type { RecipeIngredient } from '../../../shared/domain';
import type { DietTag, EaterFlag, WeekMember } from '../../../shared/schemas/week';

export interface FlagProduct {
  id: string;
  name: string;
  heat: number;
}

export interface FlagRecipe {
  productId: string;
  name: string;
  ingredients: RecipeIngredient[];
}

/** What in a recipe goes against each diet, and how to say so. */
const DIET_CONFLICTS: Record<
  DietTag,
  { finds: (ingredient: RecipeIngredient) => boolean; says: string; word: string }
> = {
  'no-added-sugar': {
    finds: (i) => i.role === 'sweetener' && /sugar/i.test(i.name),
    says: 'sweetens with sugar',
    word: 'Sugar',
  },
  'low-salt': { finds: (i) => /salt/i.test(i.name), says: 'has added salt', word: 'Salt' },
};

/** The diets a product's recipes go against, by the same rules as the flags. */
export function dietConflictsOf(productId: string, recipes: FlagRecipe[]): DietTag[] {
  return (Object.keys(DIET_CONFLICTS) as DietTag[]).filter((tag) =>
    recipes.some((r) => r.productId === productId && r.ingredients.some(DIET_CONFLICTS[tag].finds)),
  );
}

const firstName = (name: string) => name.split(' ')[0];

export function eaterFlags(product: FlagProduct, recipes: FlagRecipe[], eaters: WeekMember[]): EaterFlag[] {
  const flags: EaterFlag[] = [];
  for (const eater of eaters) {
    if (product.heat > eater.heatTolerance) {
      flags.push({
        kind: 'heat',
        userId: eater.userId,
        label: `Too hot for ${firstName(eater.name)}`,
        reason: `${product.name} is heat ${product.heat}; ${eater.name} keeps to heat ${eater.heatTolerance} or milder.`,
      });
    }
    for (const tag of eater.dietTags) {
      const conflict = DIET_CONFLICTS[tag];
      const recipe = recipes.find((r) => r.productId === product.id && r.ingredients.some(conflict.finds));
      if (recipe) {
        const ingredient = recipe.ingredients.find(conflict.finds)!;
        flags.push({
          kind: 'diet',
          userId: eater.userId,
          label: `${conflict.word}: not for ${firstName(eater.name)}`,
          reason: `${recipe.name} ${conflict.says} (${ingredient.name.toLowerCase()}); ${eater.name} eats ${tag === 'low-salt' ? 'low salt' : 'no added sugar'}.`,
        });
      }
    }
  }
  return flags;
}
