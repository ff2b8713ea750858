import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { AltitudeRow, JarSize, Method, RecipeIngredient } from '../../../shared/domain';
import { decimal, requiredUuid, uuidKey } from './columns';

export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare productId: string;
  declare name: string;
  declare yieldJars: number;
  declare yieldJarSize: JarSize;
  declare ingredients: RecipeIngredient[];
  declare acidPercent: CreationOptional<number | null>;
  declare ph: CreationOptional<number | null>;
  declare acidified: CreationOptional<boolean>;
  declare method: Method;
  /** Tested minutes at 0-1,000 ft, by jar size. */
  declare baseMinutes: Partial<Record<JarSize, number>>;
  declare altitudeTable: CreationOptional<AltitudeRow[] | null>;
  declare headspaceInches: number;
  declare steps: CreationOptional<string>;
  declare source: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Recipe.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        productId: requiredUuid(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        yieldJars: { type: DataTypes.INTEGER, allowNull: false },
        yieldJarSize: { type: DataTypes.STRING(20), allowNull: false },
        ingredients: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        acidPercent: decimal('acidPercent', 4, 2, true),
        ph: decimal('ph', 4, 2, true),
        acidified: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        method: { type: DataTypes.STRING(20), allowNull: false },
        baseMinutes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        altitudeTable: { type: DataTypes.JSONB, allowNull: true },
        headspaceInches: decimal('headspaceInches', 4, 3),
        steps: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        source: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'recipes' },
    );
  }
}
