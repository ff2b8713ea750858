import type { Transaction } from 'sequelize';
import type { Household, User } from '../db/models';
import { seedPlaces } from './places';
import { seedSealCheck } from './seal-check';
import { seedShelf } from './shelf';
import { seedStock } from './stock';
import { seedWeek } from './week';
import { seedProposalScenario } from './week-proposal';
import { seedTodos } from './todos';

export interface DemoSeedContext {
  /** by household name, as in demo-accounts.json */
  households: Record<string, Household>;
  /** by e-mail */
  members: Record<string, User>;
  transaction: Transaction;
  /** the first household's today, YYYY-MM-DD; demo dates are laid out around it */
  today: string;
}

/** Each feature adds its part of our invented demo scenario here, in dependency order. */
export async function seedDemoFeatures(ctx: DemoSeedContext) {
  await seedShelf(ctx);
  await seedSealCheck(ctx);
  await seedPlaces(ctx);
  await seedStock(ctx);
  await seedWeek(ctx);
  await seedProposalScenario(ctx);
  await seedTodos(ctx);
}
