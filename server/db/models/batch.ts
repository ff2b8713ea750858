import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { JarSize, Method, Mouth } from '../../../shared/domain';
import { decimal, requiredUuid, uuidKey } from './columns';

export class Batch extends Model<InferAttributes<Batch>, InferCreationAttributes<Batch>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare productId: string;
  declare recipeId: CreationOptional<string | null>;
  declare cannedOn: string;
  declare jarSize: JarSize;
  /** The jars' mouth, for their lids; null for batches recorded before stock was kept (the size's usual mouth). */
  declare mouth: CreationOptional<Mouth | null>;
  declare jarsFilled: number;
  declare jarsSealed: number;
  declare method: Method;
  declare altitudeFt: number;
  declare minutes: CreationOptional<number | null>;
  declare pressurePsi: CreationOptional<number | null>;
  declare headspaceInches: CreationOptional<number | null>;
  declare notes: CreationOptional<string>;
  declare photoKey: CreationOptional<string | null>;
  declare photoType: CreationOptional<string | null>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Batch.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        productId: requiredUuid(),
        recipeId: { type: DataTypes.UUID, allowNull: true },
        cannedOn: { type: DataTypes.DATEONLY, allowNull: false },
        jarSize: { type: DataTypes.STRING(20), allowNull: false },
        mouth: { type: DataTypes.STRING(7), allowNull: true },
        jarsFilled: { type: DataTypes.INTEGER, allowNull: false },
        jarsSealed: { type: DataTypes.INTEGER, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false },
        altitudeFt: { type: DataTypes.INTEGER, allowNull: false },
        minutes: { type: DataTypes.INTEGER, allowNull: true },
        pressurePsi: { type: DataTypes.INTEGER, allowNull: true },
        headspaceInches: decimal('headspaceInches', 4, 3, true),
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        photoKey: { type: DataTypes.STRING(200), allowNull: true },
        photoType: { type: DataTypes.STRING(40), allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batches' },
    );
  }
}
