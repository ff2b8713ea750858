import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

/** The weekly digest claimed for one household, person and week. */
export class DigestDelivery extends Model<InferAttributes<DigestDelivery>, InferCreationAttributes<DigestDelivery>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare userId: string;
  declare weekOf: string;
  declare emailSent: CreationOptional<boolean>;
  declare problem: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    DigestDelivery.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        userId: requiredUuid(),
        weekOf: { type: DataTypes.DATEONLY, allowNull: false },
        emailSent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        problem: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'digest_deliveries' },
    );
  }
}
