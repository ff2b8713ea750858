import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Method } from '../../../shared/domain';
import { requiredUuid, uuidKey } from './columns';

/** One time a batch's jars went through the canner: number 1 when recorded, number 2 for jars reprocessed after the seal check. */
export class BatchProcessing extends Model<InferAttributes<BatchProcessing>, InferCreationAttributes<BatchProcessing>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare batchId: string;
  declare number: number;
  declare processedAt: Date;
  declare method: Method;
  declare altitudeFt: number;
  declare minutes: number | null;
  declare pressurePsi: number | null;
  declare jars: number;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BatchProcessing.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        batchId: requiredUuid(),
        number: { type: DataTypes.INTEGER, allowNull: false },
        processedAt: { type: DataTypes.DATE, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false },
        altitudeFt: { type: DataTypes.INTEGER, allowNull: false },
        minutes: { type: DataTypes.INTEGER, allowNull: true },
        pressurePsi: { type: DataTypes.INTEGER, allowNull: true },
        jars: { type: DataTypes.INTEGER, allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_processings' },
    );
  }
}
