// A CSV of past batches: checked row by row, previewed, and written all at once or not at all.
// Two shapes: one row a batch (jars_filled, jars_sealed), or one row a jar as the shelf's own export writes it
// (state, and a batch number grouping the jars canned together), so an exported shelf imports into another household.
import Papa from 'papaparse';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { z } from 'zod';
import { recipeProcessingPlan } from '../../../shared/processing-plan';
import {
  defaultUseWithinDays,
  requireIsoDate,
  useBy,
  type JarSize,
  type JarState,
  type Method,
  type ProductKind,
} from '../../../shared/domain';
import { giftRecipientText, type ImportProblem, type ImportRow } from '../../../shared/schemas/batches';
import { LIMITS, limitWords } from '../../../shared/schemas/limits';
import { csvChoiceList, readCsvChoice, type CsvChoiceColumn } from '../../../shared/words/csv';
import { Jar, JarEvent, Place, Product, Recipe, type Household } from '../../db/models';
import { AppError } from '../../http/errors';
import { todayIn } from '../clock';
import { requireConfirmedAltitude } from '../households';
import { unguardCell } from './csv-cells';
import { placeByName, placeNewJars } from './places';
import { withFreshJarCodes, writeBatch, type BatchRecord } from './write-batch';

export const IMPORT_COLUMNS = [
  'product',
  'recipe',
  'canned_on',
  'jar_size',
  'jars_filled',
  'jars_sealed',
  'method',
  'minutes',
  'notes',
  'place',
] as const;
const ALWAYS = ['product', 'canned_on', 'jar_size', 'method'];
const BATCH_ROWS = ['jars_filled', 'jars_sealed'];

const isDate = (value: string) => {
  try {
    requireIsoDate(value);
    return true;
  } catch {
    return false;
  }
};
const date = z.string().trim().refine(isDate, 'Write the date as YYYY-MM-DD, for example 2026-08-14.');
const optionalDate = z
  .string()
  .trim()
  .refine((v) => v === '' || isDate(v), 'Write the date as YYYY-MM-DD, for example 2026-08-14, or leave it empty.')
  .optional()
  .default('');
const choice = <C extends CsvChoiceColumn>(column: C) =>
  z.string().transform((value, ctx) => {
    const id = readCsvChoice(column, value);
    if (id === undefined) ctx.addIssue({ code: 'custom', message: `Use one of: ${csvChoiceList(column)}.` });
    return id!;
  });
const wholeJars = (what: string) =>
  z
    .string()
    .trim()
    .regex(/^\d+$/, `Enter ${what} as a whole number.`)
    .transform(Number)
    .pipe(z.number().max(LIMITS.jarsPerBatch, `Use at most ${LIMITS.jarsPerBatch} jars.`));

const common = {
  product: z
    .string()
    .trim()
    .min(1, 'Name the product.')
    .max(LIMITS.length.productName, `Use at most ${LIMITS.length.productName} characters.`),
  kind: z
    .string()
    .optional()
    .default('')
    .pipe(z.union([z.literal(''), choice('kind')])),
  recipe: z.string().trim().optional().default(''),
  canned_on: date,
  jar_size: choice('jar_size'),
  method: choice('method'),
  minutes: z
    .string()
    .trim()
    .regex(/^\d*$/, 'Enter the minutes as a whole number, or leave it empty.')
    .refine(
      (v) => v === '' || Number(v) <= LIMITS.batchMinutes,
      `Use at most ${limitWords(LIMITS.batchMinutes)} minutes.`,
    )
    .optional()
    .default(''),
  notes: z
    .string()
    .max(LIMITS.length.notes, `Use at most ${limitWords(LIMITS.length.notes)} characters.`)
    .optional()
    .default(''),
  // Files from before places have no such column: the jars then have no place.
  place: z
    .string()
    .trim()
    .max(LIMITS.length.placeName, `Use at most ${LIMITS.length.placeName} characters for a place.`)
    .refine((name) => !/[\p{Cc}\p{Cf}]/u.test(name), 'Write the place without control characters.')
    .optional()
    .default(''),
};

const batchRow = z
  .object({
    ...common,
    jars_filled: wholeJars('the jars filled').pipe(z.number().min(1, 'Fill at least 1 jar.')),
    jars_sealed: wholeJars('the jars sealed'),
  })
  .refine((row) => row.jars_sealed <= row.jars_filled, {
    path: ['jars_sealed'],
    message: 'More jars cannot seal than were filled.',
  });

const jarRow = z.object({
  ...common,
  batch: z.string().trim().optional().default(''),
  jar_code: z.string().trim().toUpperCase().optional().default(''),
  state: choice('state'),
  unsealed: z
    .string()
    .trim()
    .toLowerCase()
    .optional()
    .default('')
    .pipe(z.enum(['', 'yes', 'no'], { error: 'Write yes or no.' })),
  best_by: optionalDate,
  opened_on: optionalDate,
  use_by: optionalDate,
  finished_on: optionalDate,
  discarded_on: optionalDate,
  given_on: optionalDate,
  given_to: giftRecipientText.optional().default(''),
});
type JarRow = z.infer<typeof jarRow>;

/** Spreadsheet rows count from 1 and the header is row 1, so the first batch is row 2. */
const sheetRow = (index: number) => index + 2;

interface Planned {
  product: Product | { name: string; kind: ProductKind };
  record: Omit<BatchRecord, 'productId'>;
  /** One row a jar: each jar's state and dates, in the order writeBatch makes them (sealed lids first). */
  jars?: JarRow[];
  /** One row a batch: where its jars go ('' for no place). */
  place?: string;
}

export async function checkImport(household: Household, csv: string) {
  requireConfirmedAltitude(household);
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
    transform: (value) => unguardCell(value),
  });
  const problems: ImportProblem[] = [];
  const columns = parsed.meta.fields ?? [];
  const jarShaped = columns.includes('state') && !columns.includes('jars_filled');
  const needed = [...ALWAYS, ...(jarShaped ? [] : BATCH_ROWS)];
  const missing = needed.filter((column) => !columns.includes(column));
  const none = (problem: ImportProblem) => ({ rows: [] as ImportRow[], planned: [] as Planned[], problems: [problem] });
  if (missing.length) {
    return none({
      row: 1,
      field: missing[0],
      message: `The header row needs the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}. Columns: ${IMPORT_COLUMNS.join(', ')} (or one row a jar, as the shelf export writes it).`,
    });
  }
  if (parsed.data.length === 0) return none({ row: 2, field: '_', message: 'The file has a header but no batches.' });
  if (parsed.data.length > (jarShaped ? LIMITS.importRows * LIMITS.jarsPerBatch : LIMITS.importRows)) {
    return none({
      row: 1,
      field: '_',
      message: `Import at most ${LIMITS.importRows} batches at a time; split the file.`,
    });
  }
  for (const error of parsed.errors) {
    if (error.row !== undefined)
      problems.push({ row: sheetRow(error.row), field: '_', message: `This row could not be read: ${error.message}.` });
  }

  const [products, recipes] = await Promise.all([
    Product.findAll({ where: { householdId: household.id } }),
    Recipe.findAll({ where: { householdId: household.id } }),
  ]);
  const productByName = new Map<string, Planned['product']>(products.map((p) => [p.name.toLowerCase(), p]));
  const today = todayIn(household.timeZone);
  const rows: ImportRow[] = [];
  const planned: Planned[] = [];

  /** The batch a row (or a batch's first jar row) describes, or a problem. */
  function batchOf(
    row: number,
    value: z.infer<typeof batchRow> | JarRow,
    jarsFilled: number,
    jarsSealed: number,
  ): Planned | undefined {
    let product = productByName.get(value.product.toLowerCase());
    if (!product && value.kind) {
      product = { name: value.product, kind: value.kind };
      productByName.set(value.product.toLowerCase(), product);
    }
    if (!product)
      return void problems.push({
        row,
        field: 'product',
        message: `There is no product called “${value.product}”. Add it first, fix the name, or give its kind in a kind column.`,
      });
    if (value.canned_on > today)
      return void problems.push({ row, field: 'canned_on', message: 'A batch cannot be dated in the future.' });
    const existing = product instanceof Product ? product : null;
    const recipe =
      value.recipe && existing
        ? recipes.find((r) => r.productId === existing.id && r.name.toLowerCase() === value.recipe.toLowerCase())
        : null;
    if (value.recipe && !recipe)
      return void problems.push({
        row,
        field: 'recipe',
        message: `${product.name} has no recipe called “${value.recipe}”. Fix the name or leave the recipe empty.`,
      });
    let minutes = value.minutes === '' ? null : Number(value.minutes);
    let pressurePsi: number | null = null;
    if (recipe) {
      const plan = recipeProcessingPlan(recipe, {
        jarSize: value.jar_size,
        method: value.method,
        altitudeFt: household.altitudeFt,
        unitSystem: household.unitSystem,
      });
      if (!plan.allowed)
        return void problems.push({ row, field: 'method', message: `Not allowed: ${plan.reasons.join(' ')}` });
      minutes = plan.minutes;
      pressurePsi = plan.pressurePsi;
    }
    rows.push({
      row,
      productName: product.name,
      recipeName: recipe?.name ?? null,
      cannedOn: value.canned_on,
      jarSize: value.jar_size,
      jarsFilled,
      jarsSealed,
      method: value.method,
      minutes,
    });
    const record = {
      recipeId: recipe?.id ?? null,
      cannedOn: value.canned_on,
      jarSize: value.jar_size as JarSize,
      jarsFilled,
      jarsSealed,
      method: value.method as Method,
      minutes,
      pressurePsi,
      headspaceInches: recipe?.headspaceInches ?? null,
      notes: value.notes,
    };
    return { product, record };
  }

  if (!jarShaped) {
    parsed.data.forEach((raw, index) => {
      const row = sheetRow(index);
      const result = batchRow.safeParse(raw);
      if (!result.success)
        return void result.error.issues.forEach((issue) =>
          problems.push({ row, field: String(issue.path[0] ?? '_'), message: issue.message }),
        );
      const batch = batchOf(row, result.data, result.data.jars_filled, result.data.jars_sealed);
      if (batch) planned.push({ ...batch, place: result.data.place });
    });
  } else {
    // Jars canned together: the same batch number, or without one the same product, day, size, canner and notes.
    const groups = new Map<string, { row: number; value: JarRow }[]>();
    parsed.data.forEach((raw, index) => {
      const row = sheetRow(index);
      const result = jarRow.safeParse({ ...raw, notes: raw.notes ?? raw.batch_notes });
      if (!result.success)
        return void result.error.issues.forEach((issue) =>
          problems.push({ row, field: String(issue.path[0] ?? '_'), message: issue.message }),
        );
      const jarProblem = jarDatesProblem(result.data, today);
      if (jarProblem) return void problems.push({ row, ...jarProblem });
      const v = result.data;
      const key = v.batch
        ? `#${v.batch}`
        : JSON.stringify([v.product.toLowerCase(), v.canned_on, v.jar_size, v.method, v.minutes, v.notes]);
      groups.set(key, [...(groups.get(key) ?? []), { row, value: v }]);
    });
    if (groups.size > LIMITS.importRows)
      problems.push({
        row: 1,
        field: '_',
        message: `Import at most ${LIMITS.importRows} batches at a time; split the file.`,
      });
    for (const jars of groups.values()) {
      const [first] = jars;
      const same = (v: JarRow) =>
        v.product.toLowerCase() === first.value.product.toLowerCase() &&
        v.canned_on === first.value.canned_on &&
        v.jar_size === first.value.jar_size &&
        v.method === first.value.method;
      const odd = jars.find((jar) => !same(jar.value));
      if (odd) {
        problems.push({
          row: odd.row,
          field: 'batch',
          message: `Batch ${first.value.batch} already has ${first.value.product}, canned ${first.value.canned_on}, in ${first.value.jar_size} jars; give this jar another batch number or fix it.`,
        });
        continue;
      }
      if (jars.length > LIMITS.jarsPerBatch) {
        problems.push({
          row: first.row,
          field: 'batch',
          message: `A batch holds at most ${LIMITS.jarsPerBatch} jars; split it.`,
        });
        continue;
      }
      const ordered = [
        ...jars.filter((j) => j.value.unsealed !== 'yes'),
        ...jars.filter((j) => j.value.unsealed === 'yes'),
      ].map((j) => j.value);
      const sealed = ordered.filter((j) => j.unsealed !== 'yes').length;
      const batch = batchOf(first.row, first.value, ordered.length, sealed);
      if (batch) planned.push({ ...batch, jars: ordered });
    }
  }
  await placesProblem(household, planned, problems);
  problems.sort((a, b) => a.row - b.row);
  rows.sort((a, b) => a.row - b.row);
  return { rows, planned, problems };
}

/** The names of places a file uses, in lower case, each once. */
function placeNamesOf(planned: Planned[]) {
  const names = new Map<string, string>();
  for (const plan of planned)
    for (const name of plan.jars ? plan.jars.map((jar) => jar.place) : [plan.place ?? ''])
      if (name) names.set(name.toLowerCase(), name);
  return names;
}

/** Places the file names that the household does not have are added on import, within the household's limit. */
async function placesProblem(household: Household, planned: Planned[], problems: ImportProblem[]) {
  const named = placeNamesOf(planned);
  if (named.size === 0) return;
  const existing = new Set(
    (await Place.findAll({ where: { householdId: household.id }, attributes: ['name'] })).map((p) =>
      p.name.toLowerCase(),
    ),
  );
  const added = [...named.keys()].filter((name) => !existing.has(name)).length;
  if (existing.size + added > LIMITS.places)
    problems.push({
      row: 1,
      field: 'place',
      message: `The file names ${added} new places, and a household keeps at most ${LIMITS.places}. Use places the household has, or remove some first.`,
    });
}

/** A jar row's dates fit its state: opened, finished and discarded jars say when, and nothing happens before canning or after today. */
function jarDatesProblem(jar: JarRow, today: string): Omit<ImportProblem, 'row'> | null {
  const need: Partial<Record<JarState, keyof JarRow>> = {
    finished: 'finished_on',
    discarded: 'discarded_on',
    given: 'given_on',
  };
  if (jar.state === 'opened' && jar.unsealed !== 'yes' && !jar.opened_on)
    return { field: 'opened_on', message: 'An opened jar needs the day it was opened.' };
  const field = need[jar.state];
  if (field && !jar[field])
    return {
      field,
      message: `A ${jar.state} jar needs the day it was ${jar.state === 'given' ? 'given away' : jar.state}.`,
    };
  if (jar.state === 'sealed' && jar.unsealed === 'yes')
    return { field: 'unsealed', message: 'A jar that did not seal cannot be sealed; write opened.' };
  for (const key of ['opened_on', 'finished_on', 'discarded_on', 'given_on'] as const) {
    if (jar[key] && jar[key] < jar.canned_on) return { field: key, message: 'This day is before the jar was canned.' };
    if (jar[key] && jar[key] > today) return { field: key, message: 'This day is in the future.' };
  }
  return null;
}

/** Label codes from the file that no jar carries yet stay on their jars, so a moved shelf needs no new labels. */
async function freeCodes(sequelize: Sequelize, transaction: Transaction, planned: Planned[]) {
  const codes = planned
    .flatMap((p) => p.jars ?? [])
    .map((jar) => jar.jar_code)
    .filter((code) => /^[0-9A-HJKMNP-TV-Z]{6}$/.test(code));
  if (codes.length === 0) return new Set<string>();
  const taken = await sequelize.query<{ code: string }>('SELECT code FROM jars WHERE code = ANY($1::varchar[])', {
    bind: [codes],
    type: QueryTypes.SELECT,
    transaction,
  });
  const takenSet = new Set(taken.map((row) => row.code));
  return new Set(codes.filter((code) => !takenSet.has(code)));
}

/** Gives the jars writeBatch made the states and dates of the file's rows, with the events that got them there. */
async function applyJarRows(
  household: Household,
  product: Product,
  jars: Jar[],
  rows: JarRow[],
  free: Set<string>,
  userId: string,
  transaction: Transaction,
) {
  const useWithin = product.useWithinDays ?? defaultUseWithinDays(product.kind);
  for (const [index, jar] of jars.entries()) {
    const row = rows[index];
    const changes: Partial<Jar> = {};
    if (row.best_by) changes.bestBy = row.best_by;
    if (row.jar_code && free.has(row.jar_code)) {
      changes.code = row.jar_code;
      free.delete(row.jar_code);
    }
    const events: ('opened' | 'finished' | 'discarded' | 'given')[] = [];
    const openedOn = row.opened_on || (jar.unsealed ? jar.openedOn : null);
    if (row.state !== 'sealed' && openedOn && !jar.unsealed) events.push('opened');
    if (row.state === 'opened' || (row.state !== 'sealed' && openedOn)) {
      changes.openedOn = openedOn;
      changes.useBy = row.use_by || (openedOn ? useBy(openedOn, useWithin) : null);
    }
    if (row.state === 'finished') {
      Object.assign(changes, { finishedOn: row.finished_on, remainingTbsp: 0 });
      events.push('finished');
    }
    if (row.state === 'discarded') {
      changes.discardedOn = row.discarded_on;
      events.push('discarded');
    }
    if (row.state === 'given') {
      Object.assign(changes, { givenOn: row.given_on, givenTo: row.given_to || null });
      events.push('given');
    }
    changes.state = row.state;
    await jar.update(changes, { transaction });
    const day = {
      opened: changes.openedOn,
      finished: row.finished_on,
      discarded: row.discarded_on,
      given: row.given_on,
    };
    if (events.length)
      await JarEvent.bulkCreate(
        events.map((kind) => ({
          householdId: household.id,
          jarId: jar.id,
          batchId: jar.batchId,
          kind,
          userId,
          happenedOn: day[kind]!,
          givenTo: kind === 'given' ? row.given_to || null : null,
        })),
        { transaction },
      );
  }
}

/** Writes every batch in one transaction; a single bad row writes nothing. */
export async function importBatches(sequelize: Sequelize, household: Household, csv: string, userId: string) {
  const { rows, planned, problems } = await checkImport(household, csv);
  if (problems.length) {
    const first = problems[0];
    throw new AppError(
      422,
      'invalid_input',
      `Nothing was imported. Row ${first.row}: ${first.message}${problems.length > 1 ? ` (and ${problems.length - 1} more problem${problems.length > 2 ? 's' : ''})` : ''}`,
      undefined,
      { problems, rows },
    );
  }
  await withFreshJarCodes(sequelize, async (transaction) => {
    const made = new Map<string, Product>();
    const free = await freeCodes(sequelize, transaction, planned);
    const places = new Map<string, Place>();
    for (const [lower, name] of placeNamesOf(planned))
      places.set(lower, await placeByName(household.id, name, transaction));
    const placeOf = (name: string | undefined) => (name ? places.get(name.toLowerCase())! : null);
    for (const plan of planned) {
      let product = plan.product instanceof Product ? plan.product : made.get(plan.product.name.toLowerCase());
      if (!product) {
        product = await Product.create(
          { householdId: household.id, name: plan.product.name, kind: (plan.product as { kind: ProductKind }).kind },
          { transaction },
        );
        made.set(product.name.toLowerCase(), product);
      }
      const { jars } = await writeBatch(
        household,
        product,
        { ...plan.record, productId: product.id },
        userId,
        transaction,
      );
      if (plan.jars) await applyJarRows(household, product, jars, plan.jars, free, userId, transaction);
      if (plan.jars) {
        for (const [lower, place] of places)
          await placeNewJars(
            jars.filter((_, index) => plan.jars![index].place.toLowerCase() === lower),
            place,
            transaction,
          );
      } else await placeNewJars(jars, placeOf(plan.place), transaction);
    }
  });
  return { imported: rows.length, jars: rows.reduce((sum, row) => sum + row.jarsFilled, 0) };
}
