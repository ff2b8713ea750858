import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { uuidKey } from './columns';

/** A sign-up waiting for the link mailed to its address; only the token's hash is kept. */
export class SignUpRequest extends Model<InferAttributes<SignUpRequest>, InferCreationAttributes<SignUpRequest>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare name: string;
  declare householdName: string;
  declare passwordHash: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SignUpRequest.init(
      {
        id: uuidKey(),
        email: { type: DataTypes.STRING(254), allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        householdName: { type: DataTypes.STRING(200), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sign_up_requests' },
    );
  }
}
