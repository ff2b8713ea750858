import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

export const REMINDER_KINDS = ['soon', 'today'] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

/** A use-by reminder claimed for one jar, kind and person; the unique key makes it go out once. */
export class ReminderDelivery extends Model<InferAttributes<ReminderDelivery>, InferCreationAttributes<ReminderDelivery>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare jarId: string;
  declare userId: string;
  declare kind: ReminderKind;
  declare useBy: string;
  declare pushesSent: CreationOptional<number>;
  declare emailSent: CreationOptional<boolean>;
  declare problem: CreationOptional<string | null>;
  declare claimedAt: CreationOptional<Date>;
  /** when the sends finished; null while claimed, or after a crash until a later sweep retries */
  declare sentAt: CreationOptional<Date | null>;
  declare attempts: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ReminderDelivery.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        jarId: requiredUuid(),
        userId: requiredUuid(),
        kind: { type: DataTypes.STRING(12), allowNull: false },
        useBy: { type: DataTypes.DATEONLY, allowNull: false },
        pushesSent: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        emailSent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        problem: { type: DataTypes.TEXT, allowNull: true },
        claimedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'reminder_deliveries' },
    );
  }
}
