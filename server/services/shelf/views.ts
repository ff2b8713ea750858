// How shelf rows look to the client: one place that turns models into the shared view shapes.
import { defaultUseWithinDays, JAR_STATES, type JarState } from '../../../shared/domain';
import type { BatchView, JarView } from '../../../shared/schemas/batches';
import type { ProductView } from '../../../shared/schemas/products';
import type { ProductColour } from '../../../shared/shelf-words';
import type { RecipeView } from '../../../shared/schemas/recipes';
import type { Batch, Jar, Product, Recipe } from '../../db/models';

export function productView(product: Product): ProductView {
  return {
    id: product.id,
    name: product.name,
    kind: product.kind,
    heat: product.heat,
    favourite: product.favourite,
    minJars: product.minJars,
    useWithinDays: product.useWithinDays,
    effectiveUseWithinDays: product.useWithinDays ?? defaultUseWithinDays(product.kind),
    harvestMonths: product.harvestMonths,
    jarSize: product.jarSize,
    colour: product.colour as ProductColour,
    notes: product.notes,
  };
}

export function recipeView(recipe: Recipe, productName: string): RecipeView {
  return {
    id: recipe.id,
    productId: recipe.productId,
    productName,
    name: recipe.name,
    yieldJars: recipe.yieldJars,
    yieldJarSize: recipe.yieldJarSize,
    ingredients: recipe.ingredients,
    acidPercent: recipe.acidPercent,
    ph: recipe.ph,
    acidified: recipe.acidified,
    method: recipe.method,
    baseMinutes: recipe.baseMinutes,
    altitudeTable: recipe.altitudeTable,
    headspaceInches: recipe.headspaceInches,
    steps: recipe.steps,
    source: recipe.source,
  };
}

export function jarView(jar: Jar, batch: Batch, product: Product, today: string): JarView {
  return {
    id: jar.id,
    code: jar.code,
    state: jar.state,
    unsealed: jar.unsealed,
    bestBy: jar.bestBy,
    openedOn: jar.openedOn,
    useBy: jar.useBy,
    finishedOn: jar.finishedOn,
    discardedOn: jar.discardedOn,
    capacityTbsp: jar.capacityTbsp,
    remainingTbsp: jar.remainingTbsp,
    batchId: batch.id,
    cannedOn: batch.cannedOn,
    jarSize: batch.jarSize,
    batchNotes: batch.notes,
    productId: product.id,
    productName: product.name,
    productKind: product.kind,
    productColour: product.colour,
    pastBestQuality: jar.state === 'sealed' && jar.bestBy < today,
  };
}

export function batchView(batch: Batch, product: Product, recipe: Recipe | null, jarStates: JarState[]): BatchView {
  const jarCounts = Object.fromEntries(JAR_STATES.map((state) => [state, jarStates.filter((s) => s === state).length])) as Record<JarState, number>;
  return {
    id: batch.id,
    productId: product.id,
    productName: product.name,
    recipeId: recipe?.id ?? null,
    recipeName: recipe?.name ?? null,
    cannedOn: batch.cannedOn,
    jarSize: batch.jarSize,
    jarsFilled: batch.jarsFilled,
    jarsSealed: batch.jarsSealed,
    method: batch.method,
    altitudeFt: batch.altitudeFt,
    minutes: batch.minutes,
    pressurePsi: batch.pressurePsi,
    headspaceInches: batch.headspaceInches,
    notes: batch.notes,
    hasPhoto: batch.photoKey !== null,
    jarCounts,
  };
}
