import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

/** One person's private calendar address for one household; the secret itself is never stored. */
export class CalendarFeed extends Model<InferAttributes<CalendarFeed>, InferCreationAttributes<CalendarFeed>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare userId: string;
  /** SHA-256 of the address's secret, in hex. */
  declare tokenHash: string;
  declare lastFetchedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CalendarFeed.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        userId: requiredUuid(),
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        lastFetchedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'calendar_feeds' },
    );
  }
}
