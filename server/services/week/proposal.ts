// The week board's meal proposal: reads the plan, shelf, library and members, asks the domain, and writes what the cook accepts.
import { QueryTypes, type Sequelize } from 'sequelize';
import {
  addDays,
  planWaste,
  proposeMeals,
  type AllocationJar,
  type PlannedPortion,
  type PlanWaste,
} from '../../../shared/domain';
import { proposalReasonWords } from '../../../shared/words/proposal';
import { SLOTS, weekDates, type Slot } from '../../../shared/schemas/week';
import type { ProposalAccept, ProposalRequest, ProposalView, WasteFigure } from '../../../shared/schemas/week-proposal';
import type { Household } from '../../db/models';
import { AppError } from '../../http/errors';
import { todayIn } from '../clock';
import { dietConflictsOf } from './eater-flags';
import { listMeals } from './meals';
import { insertPlanEntry, requireMembers } from './plan-entries';
import { lockDays } from './slot-locks';
import { allocationJar } from './read-week';
import { currentJarRows, entryRows, memberRows, productRows, recipeRows } from './week-rows';
import { PlanEntry } from '../../db/models';

/** Meals planned this many days either side of the week count for variety. */
const VARIETY_REACH = 14;

/** Who usually eats each meal: those at its latest planned entry (null for everybody). */
function usualEaters(sequelize: Sequelize, householdId: string) {
  return sequelize.query<{ meal_id: string; eaters: string[] | null }>(
    `SELECT DISTINCT ON (meal_id) meal_id, eaters FROM plan_entries
      WHERE household_id = :householdId AND meal_id IS NOT NULL ORDER BY meal_id, date DESC, created_at DESC`,
    { replacements: { householdId }, type: QueryTypes.SELECT },
  );
}

async function weekPlan(sequelize: Sequelize, household: Household, start: string) {
  const today = todayIn(household.timeZone);
  const end = addDays(start, 6);
  const earliest = today < start ? today : start;
  const [rows, products] = await Promise.all([
    entryRows(sequelize, household.id, addDays(earliest, -VARIETY_REACH), addDays(end, VARIETY_REACH)),
    productRows(sequelize, household.id),
  ]);
  const jarRows = await currentJarRows(
    sequelize,
    household.id,
    products.map((p) => p.id),
  );
  const productById = new Map(products.map((p) => [p.id, p]));
  const jars: AllocationJar[] = jarRows.map((j) => allocationJar(j, productById));
  // Portions from today draw first, including any before this week's start.
  const portions: PlannedPortion[] = rows
    .filter((r) => r.pairing_id && r.product_id && r.date >= today && r.date <= end)
    .map((r) => ({
      id: r.pairing_id!,
      date: r.date,
      productId: r.product_id!,
      tbsp: Number(r.tbsp_per_serving) * r.servings,
    }));
  return { today, end, rows, products, productById, jars, jarRows, portions };
}

const figure = (waste: PlanWaste): WasteFigure => ({
  tbspPastUseBy: Math.round(waste.tbspPastUseBy * 100) / 100,
  sealedJarsPastBest: waste.sealedJarsPastBest,
});

/** The week's waste as planned; nothing when the week is over. */
export async function weekWaste(sequelize: Sequelize, household: Household, start: string): Promise<WasteFigure> {
  const { today, end, jars, portions } = await weekPlan(sequelize, household, start);
  if (end < today) return { tbspPastUseBy: 0, sealedJarsPastBest: 0 };
  return figure(planWaste({ today, until: end, jars, portions }));
}

export async function proposeWeek(
  sequelize: Sequelize,
  household: Household,
  request: ProposalRequest,
): Promise<ProposalView> {
  const start = request.start;
  const { today, end, rows, products, productById, jars, jarRows, portions } = await weekPlan(
    sequelize,
    household,
    start,
  );
  const { scope } = request;
  if (scope.kind === 'day' && (scope.date < start || scope.date > end)) {
    throw new AppError(400, 'invalid_input', 'Choose a day of this week.', { scope: 'Choose a day of this week.' });
  }
  if (end < today)
    return {
      start,
      end,
      before: { tbspPastUseBy: 0, sealedJarsPastBest: 0 },
      after: { tbspPastUseBy: 0, sealedJarsPastBest: 0 },
      proposed: [],
      unfilled: [],
    };

  const taken = new Set(rows.map((r) => `${r.date}|${r.slot}`));
  const days = weekDates(start).filter((d) => d >= today && (scope.kind !== 'day' || d === scope.date));
  const kinds: readonly Slot[] = scope.kind === 'slot' ? [scope.slot] : SLOTS;
  const open = days.flatMap((date) =>
    kinds.filter((slot) => !taken.has(`${date}|${slot}`)).map((slot) => ({ date, slot })),
  );

  const [meals, recipes, memberList, eaters] = await Promise.all([
    listMeals(household.id),
    recipeRows(sequelize, household.id),
    memberRows(sequelize, household.id),
    usualEaters(sequelize, household.id),
  ]);
  const flagRecipes = recipes.map((r) => ({ productId: r.product_id, name: r.name, ingredients: r.ingredients }));
  const eatersOf = new Map(eaters.map((e) => [e.meal_id, e.eaters]));
  const mealById = new Map(meals.map((m) => [m.id, m]));
  const planned = [
    ...new Map(rows.filter((r) => r.meal_id).map((r) => [r.id, { date: r.date, mealId: r.meal_id! }])).values(),
  ];

  const result = proposeMeals({
    today,
    until: end,
    jars,
    portions,
    planned,
    open,
    slotKinds: SLOTS,
    meals: meals.map((m) => ({
      id: m.id,
      tags: m.tags,
      usualServings: m.usualServings,
      products: m.products,
      eaters: eatersOf.get(m.id) ?? null,
    })),
    products: products.map((p) => ({ id: p.id, heat: p.heat, dietConflicts: dietConflictsOf(p.id, flagRecipes) })),
    members: memberList.map((m) => ({ id: m.user_id, heatTolerance: m.heat_tolerance, dietTags: m.diet_tags ?? [] })),
    varietyDays: request.varietyDays,
    keep: request.keep,
    avoid: request.avoid,
  });

  const codeOf = new Map(jarRows.map((j) => [j.id, j.code]));
  const nameOf = (productId: string) => productById.get(productId)?.name ?? 'that preserve';
  return {
    start,
    end,
    before: figure(result.before),
    after: figure(result.after),
    proposed: result.proposed.map((p) => {
      const meal = mealById.get(String(p.mealId))!;
      return {
        date: p.date,
        slot: p.slot as Slot,
        mealId: meal.id,
        title: meal.name,
        servings: p.servings,
        eaters: p.eaters === null ? null : p.eaters.map(String),
        pairings: meal.products.map((mp) => ({
          productId: mp.productId,
          name: nameOf(mp.productId),
          tbspPerServing: mp.tbspPerServing,
          jars: p.draws
            .filter((d) => d.productId === mp.productId)
            .map((d) => ({
              jarId: String(d.jarId),
              code: codeOf.get(String(d.jarId)) ?? '',
              tbsp: d.tbsp,
              opens: d.opens,
            })),
        })),
        reason: proposalReasonWords(p.reason, nameOf, p.date),
        alternatives: p.alternatives.map((id) => ({ mealId: String(id), title: mealById.get(String(id))!.name })),
      };
    }),
    unfilled: result.unfilled.map((s) => ({ date: s.date, slot: s.slot as Slot })),
  };
}

/** Writes the accepted meals as the board's drops would, all in one transaction under the days' locks. */
export async function acceptProposal(sequelize: Sequelize, householdId: string, accept: ProposalAccept) {
  return sequelize.transaction(async (transaction) => {
    const entries = await lockDays(
      sequelize,
      transaction,
      householdId,
      accept.entries.map((e) => e.date),
    );
    const ids: string[] = [];
    for (const proposed of accept.entries) {
      const entry = await insertPlanEntry(
        sequelize,
        transaction,
        householdId,
        { date: proposed.date, slot: proposed.slot, mealId: proposed.mealId, servings: proposed.servings },
        entries,
      );
      if (proposed.eaters !== null) {
        await requireMembers(householdId, proposed.eaters, transaction);
        await PlanEntry.update({ eaters: proposed.eaters }, { where: { id: entry.id, householdId }, transaction });
      }
      ids.push(entry.id);
    }
    return ids;
  });
}
