import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal, requiredUuid, uuidKey } from './columns';

export class Meal extends Model<InferAttributes<Meal>, InferCreationAttributes<Meal>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare name: string;
  declare tags: CreationOptional<string[]>;
  declare usualServings: CreationOptional<number>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Meal.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        name: { type: DataTypes.STRING(100), allowNull: false },
        tags: { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: false, defaultValue: [] },
        usualServings: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'meals' },
    );
  }
}

/** A product a meal usually goes with, and how much per serving. */
export class MealProduct extends Model<InferAttributes<MealProduct>, InferCreationAttributes<MealProduct>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare mealId: string;
  declare productId: string;
  declare tbspPerServing: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MealProduct.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        mealId: requiredUuid(),
        productId: requiredUuid(),
        tbspPerServing: decimal('tbspPerServing', 6, 2),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'meal_products' },
    );
  }
}
