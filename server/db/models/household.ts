import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Canner, Method } from '../../../shared/domain';
import { DEFAULT_MEAL_TIMES, type MealTimes } from '../../../shared/schemas/calendar';
import type { UnitSystem } from '../../../shared/schemas/households';

export class Household extends Model<InferAttributes<Household>, InferCreationAttributes<Household>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare altitudeFt: CreationOptional<number>;
  declare unitSystem: CreationOptional<UnitSystem>;
  declare timeZone: CreationOptional<string>;
  declare bestQualityMonths: CreationOptional<number>;
  /** 0 = Sunday ... 6 = Saturday */
  declare weekStartsOn: CreationOptional<number>;
  /** The canners the household owns, one a method, each with its jars a load. */
  declare canners: CreationOptional<Canner[]>;
  declare defaultMethod: CreationOptional<Method>;
  /** When a keeper last confirmed the altitude; null means no processing plan may be shown yet. */
  declare altitudeConfirmedAt: CreationOptional<Date | null>;
  /** When each meal slot is eaten ("18:30"), in the household's time zone: places meals in the calendar. */
  declare mealTimes: CreationOptional<MealTimes>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The jars a load of the default canner (its first canner where none is for the default method). */
  defaultCannerCapacity(): number {
    return (this.canners.find((c) => c.method === this.defaultMethod) ?? this.canners[0])?.capacityJars ?? 7;
  }

  toPublic() {
    return {
      id: this.id,
      name: this.name,
      altitudeFt: this.altitudeFt,
      unitSystem: this.unitSystem,
      timeZone: this.timeZone,
      bestQualityMonths: this.bestQualityMonths,
      weekStartsOn: this.weekStartsOn,
      canners: this.canners,
      cannerCapacityJars: this.defaultCannerCapacity(),
      defaultMethod: this.defaultMethod,
      altitudeConfirmed: this.altitudeConfirmedAt !== null && this.altitudeConfirmedAt !== undefined,
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
        bestQualityMonths: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 12 },
        weekStartsOn: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        canners: {
          type: DataTypes.JSONB,
          allowNull: false,
          defaultValue: [{ method: 'boiling-water', capacityJars: 7 }],
        },
        defaultMethod: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'boiling-water' },
        altitudeConfirmedAt: { type: DataTypes.DATE, allowNull: true },
        mealTimes: { type: DataTypes.JSONB, allowNull: false, defaultValue: DEFAULT_MEAL_TIMES },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'households' },
    );
  }
}
