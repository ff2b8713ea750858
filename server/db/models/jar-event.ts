import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

export const JAR_EVENT_KINDS = ['filled', 'unsealed', 'opened', 'finished', 'discarded'] as const;
export type JarEventKind = (typeof JAR_EVENT_KINDS)[number];

export class JarEvent extends Model<InferAttributes<JarEvent>, InferCreationAttributes<JarEvent>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare jarId: string;
  declare batchId: string;
  declare kind: JarEventKind;
  declare userId: string | null;
  declare happenedOn: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    JarEvent.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        jarId: requiredUuid(),
        batchId: requiredUuid(),
        kind: { type: DataTypes.STRING(12), allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: true },
        happenedOn: { type: DataTypes.DATEONLY, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jar_events', updatedAt: false },
    );
  }
}
