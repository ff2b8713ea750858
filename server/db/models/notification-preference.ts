import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One person's reminder choices; a person without a row has the defaults. */
export class NotificationPreference extends Model<
  InferAttributes<NotificationPreference>,
  InferCreationAttributes<NotificationPreference>
> {
  declare userId: string;
  declare emailReminders: CreationOptional<boolean>;
  declare weeklyDigest: CreationOptional<boolean>;
  declare reminderHour: CreationOptional<number>;
  declare daysBefore: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    NotificationPreference.init(
      {
        userId: { type: DataTypes.UUID, primaryKey: true },
        emailReminders: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        weeklyDigest: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        reminderHour: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 8 },
        daysBefore: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'notification_preferences' },
    );
  }
}
