import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

/** A place a household keeps jars: "Pantry", "Cellar shelf 2". */
export class Place extends Model<InferAttributes<Place>, InferCreationAttributes<Place>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare name: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Place.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        name: { type: DataTypes.STRING(60), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'places' },
    );
  }
}
