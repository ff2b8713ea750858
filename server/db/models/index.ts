import type { Sequelize } from 'sequelize';
import { Household } from './household';
import { Membership } from './membership';
import { User } from './user';

/** Binds every model to one connection and declares how they relate. */
export function initModels(sequelize: Sequelize) {
  User.initModel(sequelize);
  Household.initModel(sequelize);
  Membership.initModel(sequelize);

  Membership.belongsTo(Household, { as: 'household', foreignKey: 'householdId' });
  Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Household.hasMany(Membership, { as: 'memberships', foreignKey: 'householdId' });
  User.hasMany(Membership, { as: 'memberships', foreignKey: 'userId' });
}

export { Household, Membership, User };
