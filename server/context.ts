import type { Sequelize } from 'sequelize';
import type { Config } from './config';

/** What every router and service may need, built once per app. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
}
