import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { requiredUuid, uuidKey } from './columns';

/** A browser's push address and the keys its payloads are encrypted for. */
export class PushSubscription extends Model<
  InferAttributes<PushSubscription>,
  InferCreationAttributes<PushSubscription>
> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare endpoint: string;
  declare p256dh: string;
  declare auth: string;
  declare userAgent: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PushSubscription.init(
      {
        id: uuidKey(),
        userId: requiredUuid(),
        endpoint: { type: DataTypes.TEXT, allowNull: false, unique: true },
        p256dh: { type: DataTypes.STRING(200), allowNull: false },
        auth: { type: DataTypes.STRING(100), allowNull: false },
        userAgent: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'push_subscriptions' },
    );
  }
}
