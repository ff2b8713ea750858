// How shelf rows look to the client: one place that turns models into the shared view shapes.
import { bestQualityBy, defaultUseWithinDays, JAR_STATES, mouthFor, type JarState } from '../../../shared/domain';
import type { BatchView, JarView } from '../../../shared/schemas/batches';
import type { ProductView } from '../../../shared/schemas/products';
import { type ProductColour } from '../../../shared/words';
import type { RecipeView } from '../../../shared/schemas/recipes';
import type { Batch, Household, Jar, Product, Recipe } from '../../db/models';
import { todayIn } from '../clock';

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
    defaultPlaceId: product.defaultPlaceId ?? null,
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

/** The household's today and best-quality months, read once per request. */
export function shelfClock(household: Household) {
  return { today: todayIn(household.timeZone), bestQualityMonths: household.bestQualityMonths };
}

/** Best quality follows the household's current setting, so changing it moves every badge at once. */
export function jarView(jar: Jar, batch: Batch, product: Product, clock: ReturnType<typeof shelfClock>): JarView {
  const bestBy = bestQualityBy(batch.cannedOn, clock.bestQualityMonths);
  return {
    id: jar.id,
    code: jar.code,
    state: jar.state,
    unsealed: jar.unsealed,
    bestBy,
    openedOn: jar.openedOn,
    useBy: jar.useBy,
    finishedOn: jar.finishedOn,
    discardedOn: jar.discardedOn,
    givenOn: jar.givenOn ?? null,
    givenTo: jar.givenTo ?? null,
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
    pastBestQuality: jar.state === 'sealed' && bestBy < clock.today,
    seal: jar.seal ?? 'checked',
    placeId: jar.placeId ?? null,
    placeName: jar.place?.name ?? null,
  };
}

export function batchView(batch: Batch, product: Product, recipe: Recipe | null, jarStates: JarState[]): BatchView {
  const jarCounts = Object.fromEntries(
    JAR_STATES.map((state) => [state, jarStates.filter((s) => s === state).length]),
  ) as Record<JarState, number>;
  return {
    id: batch.id,
    productId: product.id,
    productName: product.name,
    recipeId: recipe?.id ?? null,
    recipeName: recipe?.name ?? null,
    cannedOn: batch.cannedOn,
    jarSize: batch.jarSize,
    mouth: mouthFor(batch.jarSize, batch.mouth),
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
