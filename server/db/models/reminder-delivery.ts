import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

export const REMINDER_KINDS = ['soon', 'today', 'seal-check'] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

/** A use-by reminder claimed for one jar, kind and person; the unique key makes it go out once. */
export class ReminderDelivery extends Model<
  InferAttributes<ReminderDelivery>,
  InferCreationAttributes<ReminderDelivery>
> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  /** The jar of a use-by reminder; null for a seal check, which names its processing. */
  declare jarId: CreationOptional<string | null>;
  declare processingId: CreationOptional<string | null>;
  declare userId: string;
  declare kind: ReminderKind;
  declare useBy: CreationOptional<string | null>;
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
        jarId: { type: DataTypes.UUID, allowNull: true },
        processingId: { type: DataTypes.UUID, allowNull: true },
        userId: requiredUuid(),
        kind: { type: DataTypes.STRING(12), allowNull: false },
        useBy: { type: DataTypes.DATEONLY, allowNull: true },
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
