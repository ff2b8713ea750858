import type { Sequelize } from 'sequelize';
import { AppSetting } from './app-setting';
import { Batch } from './batch';
import { BatchProcessing } from './batch-processing';
import { CalendarFeed } from './calendar-feed';
import { DigestDelivery } from './digest-delivery';
import { Household } from './household';
import { Invitation } from './invitation';
import { Jar } from './jar';
import { JarEvent } from './jar-event';
import { Meal, MealProduct } from './meal';
import { Membership } from './membership';
import { NotificationPreference } from './notification-preference';
import { Pairing, PlanEntry } from './plan-entry';
import { Place } from './place';
import { Product } from './product';
import { PushSubscription } from './push-subscription';
import { Recipe } from './recipe';
import { ReminderDelivery } from './reminder-delivery';
import { SignUpRequest } from './sign-up-request';
import { Todo } from './todo';
import { User } from './user';

/** Binds every model to one connection and declares how they relate. */
export function initModels(sequelize: Sequelize) {
  for (const model of [
    User,
    Household,
    Membership,
    Place,
    Product,
    Recipe,
    Batch,
    BatchProcessing,
    Jar,
    JarEvent,
    Meal,
    MealProduct,
    PlanEntry,
    Pairing,
    Todo,
  ]) {
    model.initModel(sequelize);
  }
  for (const model of [
    AppSetting,
    PushSubscription,
    NotificationPreference,
    ReminderDelivery,
    DigestDelivery,
    Invitation,
    CalendarFeed,
    SignUpRequest,
  ])
    model.initModel(sequelize);

  Membership.belongsTo(Household, { as: 'household', foreignKey: 'householdId' });
  Invitation.belongsTo(Household, { as: 'household', foreignKey: 'householdId' });
  Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Household.hasMany(Membership, { as: 'memberships', foreignKey: 'householdId' });
  User.hasMany(Membership, { as: 'memberships', foreignKey: 'userId' });

  Product.hasMany(Recipe, { as: 'recipes', foreignKey: 'productId' });
  Recipe.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Product.hasMany(Batch, { as: 'batches', foreignKey: 'productId' });
  Batch.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Batch.belongsTo(Recipe, { as: 'recipe', foreignKey: 'recipeId' });
  Batch.hasMany(Jar, { as: 'jars', foreignKey: 'batchId' });
  Jar.belongsTo(Batch, { as: 'batch', foreignKey: 'batchId' });
  Jar.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Jar.belongsTo(Place, { as: 'place', foreignKey: 'placeId' });
  Jar.hasMany(JarEvent, { as: 'events', foreignKey: 'jarId' });
  Batch.hasMany(JarEvent, { as: 'events', foreignKey: 'batchId' });
  JarEvent.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Batch.hasMany(BatchProcessing, { as: 'processings', foreignKey: 'batchId' });
  BatchProcessing.belongsTo(User, { as: 'user', foreignKey: 'createdBy' });

  Meal.hasMany(MealProduct, { as: 'products', foreignKey: 'mealId' });
  MealProduct.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  PlanEntry.hasMany(Pairing, { as: 'pairings', foreignKey: 'planEntryId' });
  PlanEntry.belongsTo(Meal, { as: 'meal', foreignKey: 'mealId' });
  Pairing.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Todo.belongsTo(User, { as: 'assignee', foreignKey: 'assigneeId' });
  Todo.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
}

export {
  AppSetting,
  Batch,
  BatchProcessing,
  CalendarFeed,
  DigestDelivery,
  Household,
  Invitation,
  Jar,
  JarEvent,
  Meal,
  MealProduct,
  Membership,
  NotificationPreference,
  Pairing,
  Place,
  PlanEntry,
  Product,
  PushSubscription,
  Recipe,
  ReminderDelivery,
  SignUpRequest,
  Todo,
  User,
};
