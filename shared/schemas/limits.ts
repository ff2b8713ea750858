// Every bounded value once. The forms' schemas, the CSV import and the backup import all read these, so
// whatever a household could save through one door imports through every other (its own backup always does).

export const LIMITS = {
  /** Tested processing minutes of a recipe, and each of its altitude additions. */
  processingMinutes: 600,
  /** A batch's minutes: a recipe's tested time plus its largest altitude addition. */
  batchMinutes: 1200,
  /** Jars filled (and sealed) in one batch, and jars planned at once. */
  jarsPerBatch: 200,
  /** Headspace in inches. */
  headspaceInches: 2,
  /** Pounds of pressure a batch records. */
  pressurePsi: 30,
  /** Servings of a planned meal and a meal's usual servings. */
  servings: 100,
  /** Tablespoons of a product per serving (64, a quart). */
  tbspPerServing: 64,
  /** Jars a tested recipe makes. */
  recipeYieldJars: 100,
  ingredientsPerRecipe: 60,
  ingredientAmount: 100_000,
  altitudeRows: 20,
  altitudeFt: { min: -1500, max: 20_000 },
  /** Fewest jars a household keeps of a product. */
  minJars: 500,
  useWithinDays: 365,
  heat: 5,
  bestQualityMonths: 60,
  cannerCapacityJars: 40,
  /** Empty jars of one size, or new lids of one mouth, a household keeps counted. */
  stockCount: 10_000,
  mealTags: 12,
  planPosition: 1000,
  todoPosition: 100_000,
  /** Rows a CSV import takes at once. */
  importRows: 500,
  /** Shelf places a household names. */
  places: 100,
  /** Characters. */
  length: {
    productName: 80,
    recipeName: 120,
    ingredientName: 80,
    mealName: 100,
    mealTag: 30,
    todoTitle: 200,
    todoNotes: 4000,
    notes: 2000,
    steps: 10_000,
    source: 500,
    householdName: 80,
    personName: 80,
    placeName: 60,
    /** Whom a jar was given to (a name or a few words, optional). */
    giftRecipient: 80,
    stockNote: 200,
  },
} as const;

/** "2,000": a limit as the error messages write it. */
export const limitWords = (value: number) => value.toLocaleString('en-US');
