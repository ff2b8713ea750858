// The few queries behind GET /week: one per table, never one per entry, so the board stays fast.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { ProductKind, RecipeIngredient } from '../../../shared/domain';
import type { DietTag, Slot } from '../../../shared/schemas/week';

export interface EntryRow {
  id: string;
  date: string;
  slot: Slot;
  position: number;
  title: string;
  meal_id: string | null;
  servings: number;
  eaters: string[] | null;
  pairing_id: string | null;
  product_id: string | null;
  tbsp_per_serving: string | null;
}

export interface JarRow {
  id: string;
  code: string;
  product_id: string;
  state: 'sealed' | 'opened';
  capacity_tbsp: string;
  remaining_tbsp: string;
  best_by: string;
  opened_on: string | null;
  use_by: string | null;
}

export interface RecipeRow {
  product_id: string;
  name: string;
  ingredients: RecipeIngredient[];
}

export interface MemberRow {
  user_id: string;
  name: string;
  heat_tolerance: number;
  diet_tags: DietTag[];
}

/** Entries (with their pairings) dated from `from` to `to`, in board order. */
export function entryRows(sequelize: Sequelize, householdId: string, from: string, to: string) {
  return sequelize.query<EntryRow>(
    `SELECT e.id, e.date, e.slot, e.position, e.title, e.meal_id, e.servings, e.eaters,
            p.id AS pairing_id, p.product_id, p.tbsp_per_serving
       FROM plan_entries e LEFT JOIN pairings p ON p.plan_entry_id = e.id
      WHERE e.household_id = :householdId AND e.date BETWEEN :from AND :to
      ORDER BY e.date, e.slot, e.position, p.created_at, p.id`,
    { replacements: { householdId, from, to }, type: QueryTypes.SELECT },
  );
}

/** Every opened jar (each may turn before it is finished), and the sealed jars of the products the plan draws on. */
export function currentJarRows(sequelize: Sequelize, householdId: string, productIds: string[]) {
  return sequelize.query<JarRow>(
    `SELECT id, code, product_id, state, capacity_tbsp, remaining_tbsp, best_by, opened_on, use_by
       FROM jars
      WHERE household_id = :householdId
        AND (state = 'opened' OR (state = 'sealed' AND product_id = ANY(ARRAY[:productIds]::uuid[])))`,
    {
      replacements: {
        householdId,
        productIds: productIds.length ? productIds : ['00000000-0000-0000-0000-000000000000'],
      },
      type: QueryTypes.SELECT,
    },
  );
}

export interface ProductRow {
  id: string;
  name: string;
  kind: ProductKind;
  heat: number;
  colour: string;
  use_within_days: number | null;
  opened_jars: number;
  sealed_jars: number;
}

/** Every product with its count of opened and sealed jars, for the shelf rail. */
export function productRows(sequelize: Sequelize, householdId: string) {
  return sequelize.query<ProductRow>(
    `SELECT p.id, p.name, p.kind, p.heat, p.colour, p.use_within_days,
            count(j.id) FILTER (WHERE j.state = 'opened')::int AS opened_jars,
            count(j.id) FILTER (WHERE j.state = 'sealed')::int AS sealed_jars
       FROM products p LEFT JOIN jars j ON j.product_id = p.id AND j.state IN ('sealed', 'opened')
      WHERE p.household_id = :householdId
      GROUP BY p.id ORDER BY lower(p.name)`,
    { replacements: { householdId }, type: QueryTypes.SELECT },
  );
}

export function recipeRows(sequelize: Sequelize, householdId: string) {
  return sequelize.query<RecipeRow>(
    'SELECT product_id, name, ingredients FROM recipes WHERE household_id = :householdId ORDER BY created_at, id',
    {
      replacements: { householdId },
      type: QueryTypes.SELECT,
    },
  );
}

export function memberRows(sequelize: Sequelize, householdId: string) {
  return sequelize.query<MemberRow>(
    `SELECT m.user_id, u.name, m.heat_tolerance, m.diet_tags
       FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.household_id = :householdId ORDER BY m.created_at, m.id`,
    { replacements: { householdId }, type: QueryTypes.SELECT },
  );
}
