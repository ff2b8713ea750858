// A CSV of past batches: checked row by row, previewed, and written all at once or not at all.
import Papa from 'papaparse';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import { recipeProcessingPlan } from '../../../shared/processing-plan';
import { JAR_SIZES, PROCESSING_METHODS, requireIsoDate } from '../../../shared/domain';
import type { ImportProblem, ImportRow } from '../../../shared/schemas/batches';
import { Product, Recipe, type Household } from '../../db/models';
import { AppError } from '../../http/errors';
import { todayIn } from '../clock';
import { requireConfirmedAltitude } from '../households';
import { withFreshJarCodes, writeBatch } from './write-batch';

export const IMPORT_COLUMNS = ['product', 'recipe', 'canned_on', 'jar_size', 'jars_filled', 'jars_sealed', 'method', 'minutes', 'notes'] as const;
const REQUIRED_COLUMNS = ['product', 'canned_on', 'jar_size', 'jars_filled', 'jars_sealed', 'method'];
const MAX_ROWS = 500;

const wholeJars = (what: string) =>
  z.string().trim().regex(/^\d+$/, `Enter ${what} as a whole number.`).transform(Number).pipe(z.number().max(200, `Use at most 200 jars.`));

const rowSchema = z
  .object({
    product: z.string().trim().min(1, 'Name the product.'),
    recipe: z.string().trim().optional().default(''),
    canned_on: z.string().trim().refine((value) => {
      try {
        requireIsoDate(value);
        return true;
      } catch {
        return false;
      }
    }, 'Write the date as YYYY-MM-DD, for example 2026-08-14.'),
    jar_size: z.enum(JAR_SIZES, { error: `Use one of: ${JAR_SIZES.join(', ')}.` }),
    jars_filled: wholeJars('the jars filled').pipe(z.number().min(1, 'Fill at least 1 jar.')),
    jars_sealed: wholeJars('the jars sealed'),
    method: z.enum(PROCESSING_METHODS, { error: `Use one of: ${PROCESSING_METHODS.join(', ')}.` }),
    minutes: z.string().trim().regex(/^(\d{1,3})?$/, 'Enter the minutes as a whole number, or leave it empty.').optional().default(''),
    notes: z.string().max(2000, 'Use at most 2,000 characters.').optional().default(''),
  })
  .refine((row) => row.jars_sealed <= row.jars_filled, { path: ['jars_sealed'], message: 'More jars cannot seal than were filled.' });

/** Spreadsheet rows count from 1 and the header is row 1, so the first batch is row 2. */
const sheetRow = (index: number) => index + 2;

export async function checkImport(household: Household, csv: string) {
  requireConfirmedAltitude(household);
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim().toLowerCase() });
  const problems: ImportProblem[] = [];
  const columns = parsed.meta.fields ?? [];
  const missing = REQUIRED_COLUMNS.filter((column) => !columns.includes(column));
  if (missing.length) {
    return { rows: [], records: [], problems: [{ row: 1, field: missing[0], message: `The header row needs the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}. Columns: ${IMPORT_COLUMNS.join(', ')}.` }] };
  }
  if (parsed.data.length === 0) return { rows: [], records: [], problems: [{ row: 2, field: '_', message: 'The file has a header but no batches.' }] };
  if (parsed.data.length > MAX_ROWS) return { rows: [], records: [], problems: [{ row: 1, field: '_', message: `Import at most ${MAX_ROWS} batches at a time; split the file.` }] };
  for (const error of parsed.errors) {
    if (error.row !== undefined) problems.push({ row: sheetRow(error.row), field: '_', message: `This row could not be read: ${error.message}.` });
  }

  const [products, recipes] = await Promise.all([Product.findAll({ where: { householdId: household.id } }), Recipe.findAll({ where: { householdId: household.id } })]);
  const productByName = new Map(products.map((p) => [p.name.toLowerCase(), p]));
  const today = todayIn(household.timeZone);
  const rows: ImportRow[] = [];
  const records: { product: Product; record: Parameters<typeof writeBatch>[2] }[] = [];

  parsed.data.forEach((raw, index) => {
    const row = sheetRow(index);
    const result = rowSchema.safeParse(raw);
    if (!result.success) {
      for (const issue of result.error.issues) problems.push({ row, field: String(issue.path[0] ?? '_'), message: issue.message });
      return;
    }
    const value = result.data;
    const product = productByName.get(value.product.toLowerCase());
    if (!product) return void problems.push({ row, field: 'product', message: `There is no product called “${value.product}”. Add it first, or fix the name.` });
    if (value.canned_on > today) return void problems.push({ row, field: 'canned_on', message: 'A batch cannot be dated in the future.' });
    const recipe = value.recipe ? recipes.find((r) => r.productId === product.id && r.name.toLowerCase() === value.recipe.toLowerCase()) : null;
    if (value.recipe && !recipe) return void problems.push({ row, field: 'recipe', message: `${product.name} has no recipe called “${value.recipe}”. Fix the name or leave the recipe empty.` });
    let minutes = value.minutes === '' ? null : Number(value.minutes);
    let pressurePsi: number | null = null;
    if (recipe) {
      const plan = recipeProcessingPlan(recipe, { jarSize: value.jar_size, method: value.method, altitudeFt: household.altitudeFt });
      if (!plan.allowed) return void problems.push({ row, field: 'method', message: `Not allowed: ${plan.reasons.join(' ')}` });
      minutes = plan.minutes;
      pressurePsi = plan.pressurePsi;
    }
    rows.push({ row, productName: product.name, recipeName: recipe?.name ?? null, cannedOn: value.canned_on, jarSize: value.jar_size, jarsFilled: value.jars_filled, jarsSealed: value.jars_sealed, method: value.method, minutes });
    records.push({
      product,
      record: {
        productId: product.id,
        recipeId: recipe?.id ?? null,
        cannedOn: value.canned_on,
        jarSize: value.jar_size,
        jarsFilled: value.jars_filled,
        jarsSealed: value.jars_sealed,
        method: value.method,
        minutes,
        pressurePsi,
        headspaceInches: recipe?.headspaceInches ?? null,
        notes: value.notes,
      },
    });
  });
  problems.sort((a, b) => a.row - b.row);
  return { rows, records, problems };
}

/** Writes every batch in one transaction; a single bad row writes nothing. */
export async function importBatches(sequelize: Sequelize, household: Household, csv: string, userId: string) {
  const { rows, records, problems } = await checkImport(household, csv);
  if (problems.length) {
    const first = problems[0];
    throw new AppError(422, 'invalid_input', `Nothing was imported. Row ${first.row}: ${first.message}${problems.length > 1 ? ` (and ${problems.length - 1} more problem${problems.length > 2 ? 's' : ''})` : ''}`, undefined, { problems, rows });
  }
  await withFreshJarCodes(sequelize, async (transaction) => {
    for (const { product, record } of records) await writeBatch(household, product, record, userId, transaction);
  });
  return { imported: rows.length, jars: rows.reduce((sum, row) => sum + row.jarsFilled, 0) };
}
