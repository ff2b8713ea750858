import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import { decimal, requiredUuid, uuidKey } from './columns';

export const SLOTS = ['breakfast', 'lunch', 'dinner', 'snack'] as const;
export type Slot = (typeof SLOTS)[number];

export class PlanEntry extends Model<InferAttributes<PlanEntry>, InferCreationAttributes<PlanEntry>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare date: string;
  declare slot: Slot;
  declare position: number;
  declare title: string;
  declare mealId: CreationOptional<string | null>;
  declare servings: CreationOptional<number>;
  /** user ids of the members who eat it; null means everybody */
  declare eaters: CreationOptional<string[] | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare pairings?: NonAttribute<Pairing[]>;

  static initModel(sequelize: Sequelize) {
    PlanEntry.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        date: { type: DataTypes.DATEONLY, allowNull: false },
        slot: { type: DataTypes.STRING(10), allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(100), allowNull: false },
        mealId: { type: DataTypes.UUID, allowNull: true },
        servings: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        eaters: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plan_entries' },
    );
  }
}

/** A product paired with a planned meal, with a portion per serving. */
export class Pairing extends Model<InferAttributes<Pairing>, InferCreationAttributes<Pairing>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare planEntryId: string;
  declare productId: string;
  declare tbspPerServing: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Pairing.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        planEntryId: requiredUuid(),
        productId: requiredUuid(),
        tbspPerServing: decimal('tbspPerServing', 6, 2),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pairings' },
    );
  }
}
