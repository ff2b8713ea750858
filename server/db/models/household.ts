import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { UnitSystem } from '../../../shared/schemas/households';

export class Household extends Model<InferAttributes<Household>, InferCreationAttributes<Household>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare altitudeFt: CreationOptional<number>;
  declare unitSystem: CreationOptional<UnitSystem>;
  declare timeZone: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  toPublic() {
    return {
      id: this.id,
      name: this.name,
      altitudeFt: this.altitudeFt,
      unitSystem: this.unitSystem,
      timeZone: this.timeZone,
    };
  }

  static initModel(sequelize: Sequelize) {
    Household.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        altitudeFt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        unitSystem: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'us' },
        timeZone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'households' },
    );
  }
}
