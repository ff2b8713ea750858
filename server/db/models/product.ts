import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { JarSize, ProductKind } from '../../../shared/domain';
import { requiredUuid, uuidKey } from './columns';

export class Product extends Model<InferAttributes<Product>, InferCreationAttributes<Product>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare name: string;
  declare kind: ProductKind;
  declare heat: CreationOptional<number>;
  declare favourite: CreationOptional<boolean>;
  declare minJars: CreationOptional<number>;
  /** null: the default for the product's kind */
  declare useWithinDays: CreationOptional<number | null>;
  declare harvestMonths: CreationOptional<number[]>;
  declare jarSize: CreationOptional<JarSize>;
  declare colour: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  /** Where its batches usually go; the new-batch form offers it. */
  declare defaultPlaceId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Product.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        name: { type: DataTypes.STRING(80), allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        heat: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        favourite: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        minJars: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        useWithinDays: { type: DataTypes.INTEGER, allowNull: true },
        harvestMonths: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
        jarSize: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'half-pint' },
        colour: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'honey' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        defaultPlaceId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'products' },
    );
  }
}
