import { randomUUID } from 'node:crypto';
import { DatabaseError, QueryTypes, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import {
  BACKUP_FORMAT,
  BACKUP_VERSION,
  type BackupTable,
  type HouseholdBackup,
  type ImportResult,
} from '../../shared/schemas/backup';
import { Household, Membership } from '../db/models';
import { AppError, conflict } from '../http/errors';
import { newJarCode } from './shelf/jar-codes';
import { isTimeZone } from '../../shared/time-zones';

/** One column: its key in the file, its SQL name and type, and the table its id points into. */
type Column = [json: string, sql: string, type: string, ref?: BackupTable];

/**
 * What a backup holds, table by table in insert order. People are left out (the importer becomes
 * the keeper), and so are photos, who did what (the jar and lid stock keeps its counts, not its changes), and a batch's processings and seal check (a jar still to check
 * comes back checked; the README says so). Label codes go in, and are kept on import where no jar holds them.
 */
const TABLES: { key: BackupTable; table: string; columns: Column[]; updatedAt?: false }[] = [
  { key: 'places', table: 'places', columns: [['name', 'name', 'varchar']] },
  {
    key: 'products',
    table: 'products',
    columns: [
      ['name', 'name', 'varchar'],
      ['kind', 'kind', 'varchar'],
      ['heat', 'heat', 'int'],
      ['favourite', 'favourite', 'boolean'],
      ['minJars', 'min_jars', 'int'],
      ['useWithinDays', 'use_within_days', 'int'],
      ['harvestMonths', 'harvest_months', 'int[]'],
      ['jarSize', 'jar_size', 'varchar'],
      ['colour', 'colour', 'varchar'],
      ['notes', 'notes', 'text'],
      ['defaultPlaceId', 'default_place_id', 'uuid', 'places'],
    ],
  },
  {
    key: 'recipes',
    table: 'recipes',
    columns: [
      ['productId', 'product_id', 'uuid', 'products'],
      ['name', 'name', 'varchar'],
      ['yieldJars', 'yield_jars', 'int'],
      ['yieldJarSize', 'yield_jar_size', 'varchar'],
      ['ingredients', 'ingredients', 'jsonb'],
      ['acidPercent', 'acid_percent', 'numeric'],
      ['ph', 'ph', 'numeric'],
      ['acidified', 'acidified', 'boolean'],
      ['method', 'method', 'varchar'],
      ['baseMinutes', 'base_minutes', 'jsonb'],
      ['altitudeTable', 'altitude_table', 'jsonb'],
      ['headspaceInches', 'headspace_inches', 'numeric'],
      ['steps', 'steps', 'text'],
      ['source', 'source', 'text'],
    ],
  },
  {
    key: 'batches',
    table: 'batches',
    columns: [
      ['productId', 'product_id', 'uuid', 'products'],
      ['recipeId', 'recipe_id', 'uuid', 'recipes'],
      ['cannedOn', 'canned_on', 'date'],
      ['jarSize', 'jar_size', 'varchar'],
      ['mouth', 'mouth', 'varchar'],
      ['jarsFilled', 'jars_filled', 'int'],
      ['jarsSealed', 'jars_sealed', 'int'],
      ['method', 'method', 'varchar'],
      ['altitudeFt', 'altitude_ft', 'int'],
      ['minutes', 'minutes', 'int'],
      ['pressurePsi', 'pressure_psi', 'int'],
      ['headspaceInches', 'headspace_inches', 'numeric'],
      ['notes', 'notes', 'text'],
    ],
  },
  {
    key: 'jars',
    table: 'jars',
    columns: [
      ['batchId', 'batch_id', 'uuid', 'batches'],
      ['productId', 'product_id', 'uuid', 'products'],
      ['state', 'state', 'varchar'],
      ['capacityTbsp', 'capacity_tbsp', 'numeric'],
      ['remainingTbsp', 'remaining_tbsp', 'numeric'],
      ['unsealed', 'unsealed', 'boolean'],
      ['bestBy', 'best_by', 'date'],
      ['openedOn', 'opened_on', 'date'],
      ['useBy', 'use_by', 'date'],
      ['finishedOn', 'finished_on', 'date'],
      ['discardedOn', 'discarded_on', 'date'],
      ['givenOn', 'given_on', 'date'],
      ['givenTo', 'given_to', 'varchar'],
      ['code', 'code', 'varchar'],
      ['placeId', 'place_id', 'uuid', 'places'],
    ],
  },
  {
    key: 'jarEvents',
    table: 'jar_events',
    updatedAt: false,
    columns: [
      ['jarId', 'jar_id', 'uuid', 'jars'],
      ['batchId', 'batch_id', 'uuid', 'batches'],
      ['kind', 'kind', 'varchar'],
      ['happenedOn', 'happened_on', 'date'],
      ['placeMove', 'place_move', 'jsonb'],
      ['givenTo', 'given_to', 'varchar'],
    ],
  },
  {
    key: 'meals',
    table: 'meals',
    columns: [
      ['name', 'name', 'varchar'],
      ['tags', 'tags', 'varchar[]'],
      ['usualServings', 'usual_servings', 'int'],
      ['notes', 'notes', 'text'],
    ],
  },
  {
    key: 'mealProducts',
    table: 'meal_products',
    columns: [
      ['mealId', 'meal_id', 'uuid', 'meals'],
      ['productId', 'product_id', 'uuid', 'products'],
      ['tbspPerServing', 'tbsp_per_serving', 'numeric'],
    ],
  },
  {
    key: 'planEntries',
    table: 'plan_entries',
    columns: [
      ['date', 'date', 'date'],
      ['slot', 'slot', 'varchar'],
      ['position', 'position', 'int'],
      ['title', 'title', 'varchar'],
      ['mealId', 'meal_id', 'uuid', 'meals'],
      ['servings', 'servings', 'int'],
    ],
  },
  {
    key: 'pairings',
    table: 'pairings',
    columns: [
      ['planEntryId', 'plan_entry_id', 'uuid', 'planEntries'],
      ['productId', 'product_id', 'uuid', 'products'],
      ['tbspPerServing', 'tbsp_per_serving', 'numeric'],
    ],
  },
  {
    key: 'todos',
    table: 'todos',
    columns: [
      ['title', 'title', 'varchar'],
      ['notes', 'notes', 'text'],
      ['dueOn', 'due_on', 'date'],
      ['done', 'done', 'boolean'],
      ['doneAt', 'done_at', 'timestamptz'],
      ['position', 'position', 'int'],
      ['kind', 'kind', 'varchar'],
      ['productId', 'product_id', 'uuid', 'products'],
      ['batchPlan', 'batch_plan', 'jsonb'],
    ],
  },
  {
    key: 'jarStock',
    table: 'jar_stock',
    columns: [
      ['item', 'item', 'varchar'],
      ['size', 'size', 'varchar'],
      ['count', 'count', 'int'],
    ],
  },
];

/** The household as one JSON document, every table in a stable order. */
export async function exportHousehold(sequelize: Sequelize, household: Household): Promise<HouseholdBackup> {
  const backup: Record<string, unknown> = {
    format: BACKUP_FORMAT,
    version: BACKUP_VERSION,
    exportedAt: new Date().toISOString(),
    household: {
      name: household.name,
      altitudeFt: household.altitudeFt,
      unitSystem: household.unitSystem,
      timeZone: household.timeZone,
      bestQualityMonths: household.bestQualityMonths,
      weekStartsOn: household.weekStartsOn,
      canners: household.canners,
      defaultMethod: household.defaultMethod,
      mealTimes: household.mealTimes,
    },
  };
  for (const { key, table, columns } of TABLES) {
    const fields = [['id', 'id'], ...columns].map(([json, sql]) => `'${json}', ${sql}`).join(', ');
    const [row] = await sequelize.query<{ rows: unknown[] }>(
      `SELECT coalesce(json_agg(json_build_object(${fields}) ORDER BY created_at, id), '[]'::json) AS rows FROM ${table} WHERE household_id = $1`,
      { bind: [household.id], type: QueryTypes.SELECT },
    );
    backup[key] = row.rows;
  }
  return backup as unknown as HouseholdBackup;
}

/** A new household made from a backup, with the importer as its keeper: fresh ids, one transaction. */
export async function importHousehold(
  sequelize: Sequelize,
  backup: HouseholdBackup,
  importerId: string,
): Promise<ImportResult> {
  if (!isTimeZone(backup.household.timeZone))
    throw new AppError(400, 'invalid_input', 'The time zone in the file is not one this server knows.');
  try {
    return await sequelize.transaction(async (transaction) => {
      const { cannerCapacityJars, canners, ...settings } = backup.household;
      // Older backups give one capacity: it becomes the default canner's.
      const household = await Household.create(
        {
          ...settings,
          canners: canners ?? [{ method: settings.defaultMethod, capacityJars: cannerCapacityJars ?? 7 }],
        },
        { transaction },
      );
      await Membership.create({ householdId: household.id, userId: importerId, role: 'keeper' }, { transaction });
      const takenCodes = await codesInUse(
        sequelize,
        transaction,
        backup.jars.map((jar) => jar.code).filter((code): code is string => Boolean(code)),
      );
      const newIds = new Map<BackupTable, Map<string, string>>();
      const counts = {} as Record<BackupTable, number>;
      for (const spec of TABLES) {
        const rows = backup[spec.key] as Record<string, unknown>[];
        newIds.set(spec.key, new Map(rows.map((row) => [String(row.id), randomUUID()])));
        const remapped = rows.map((row) => remap(spec.key, spec.columns, row, newIds, takenCodes));
        await insertRows(sequelize, transaction, spec, household.id, importerId, remapped);
        counts[spec.key] = rows.length;
      }
      return { household: { id: household.id, name: household.name }, counts };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError && /code/.test(JSON.stringify(error.fields)))
      throw conflict('Two jars drew the same label code. Import the file again.');
    if (error instanceof DatabaseError && /^2[23]/.test(String((error.parent as { code?: string }).code))) {
      throw new AppError(
        400,
        'invalid_input',
        `The backup file does not fit together, so nothing was imported: ${error.message}`,
      );
    }
    throw error;
  }
}

/** The backup's label codes some jar already carries; the rest stay on their jars, so a restored shelf needs no new labels. */
async function codesInUse(sequelize: Sequelize, transaction: Transaction, codes: string[]): Promise<Set<string>> {
  if (codes.length === 0) return new Set();
  const rows = await sequelize.query<{ code: string }>('SELECT code FROM jars WHERE code = ANY($1::varchar[])', {
    bind: [codes],
    type: QueryTypes.SELECT,
    transaction,
  });
  return new Set(rows.map((row) => row.code));
}

function remap(
  key: BackupTable,
  columns: Column[],
  row: Record<string, unknown>,
  newIds: Map<BackupTable, Map<string, string>>,
  takenCodes: Set<string>,
) {
  const out: Record<string, unknown> = { ...row, id: newIds.get(key)!.get(String(row.id)) };
  for (const [json, , , ref] of columns) {
    if (!ref || row[json] === null) continue;
    out[json] = newId(newIds, ref, row[json], `${key}.${json}`);
  }
  if (key === 'jars') {
    const code = typeof row.code === 'string' ? row.code : null;
    out.code = code && !takenCodes.has(code) ? code : newJarCode();
    if (code) takenCodes.add(code);
  }
  if (key === 'todos' && row.batchPlan) {
    const plan = row.batchPlan as Record<string, unknown>;
    out.batchPlan = {
      ...plan,
      productId: newId(newIds, 'products', plan.productId, 'todos.batchPlan.productId'),
      recipeId: newId(newIds, 'recipes', plan.recipeId, 'todos.batchPlan.recipeId'),
    };
  }
  return out;
}

function newId(newIds: Map<BackupTable, Map<string, string>>, table: BackupTable, old: unknown, where: string) {
  const id = newIds.get(table)?.get(String(old));
  if (!id)
    throw new AppError(
      400,
      'invalid_input',
      `The backup file does not fit together: ${where} points to ${old}, which is not among its ${table}. Nothing was imported.`,
    );
  return id;
}

async function insertRows(
  sequelize: Sequelize,
  transaction: Transaction,
  spec: (typeof TABLES)[number],
  householdId: string,
  importerId: string,
  rows: Record<string, unknown>[],
) {
  if (rows.length === 0) return;
  const columns: Column[] = [['id', 'id', 'uuid'], ...spec.columns];
  const createdBy = spec.key === 'batches' || spec.key === 'todos';
  const names = [
    ...columns.map(([, sql]) => sql),
    'household_id',
    ...(createdBy ? ['created_by'] : []),
    'created_at',
    ...(spec.updatedAt === false ? [] : ['updated_at']),
  ];
  const values = [
    ...columns.map(([, sql]) => `r.${sql}`),
    '$2',
    ...(createdBy ? ['$3'] : []),
    'now()',
    ...(spec.updatedAt === false ? [] : ['now()']),
  ];
  const record = columns.map(([, sql, type]) => `${sql} ${type}`).join(', ');
  const asRecords = rows.map((row) => Object.fromEntries(columns.map(([json, sql]) => [sql, row[json] ?? null])));
  await sequelize.query(
    `INSERT INTO ${spec.table} (${names.join(', ')}) SELECT ${values.join(', ')} FROM jsonb_to_recordset($1::jsonb) AS r(${record})`,
    {
      bind: createdBy ? [JSON.stringify(asRecords), householdId, importerId] : [JSON.stringify(asRecords), householdId],
      transaction,
    },
  );
}
