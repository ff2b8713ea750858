import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { JarState } from '../../../shared/domain';
import { decimal, requiredUuid, uuidKey } from './columns';
import type { Place } from './place';

export type JarSeal = 'checked' | 'to-check';

export class Jar extends Model<InferAttributes<Jar>, InferCreationAttributes<Jar>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare batchId: string;
  declare productId: string;
  declare code: string;
  declare state: JarState;
  declare capacityTbsp: number;
  declare remainingTbsp: number;
  declare unsealed: CreationOptional<boolean>;
  declare bestBy: string;
  declare openedOn: CreationOptional<string | null>;
  declare useBy: CreationOptional<string | null>;
  declare finishedOn: CreationOptional<string | null>;
  declare discardedOn: CreationOptional<string | null>;
  /** The day the jar was given away, and to whom when the giver said. */
  declare givenOn: CreationOptional<string | null>;
  declare givenTo: CreationOptional<string | null>;
  /** 'to-check' while the jar cools after processing and nobody has checked its lid yet. */
  declare seal: CreationOptional<JarSeal>;
  /** The jar's latest processing (null for jars recorded before processings were kept). */
  declare processingId: CreationOptional<string | null>;
  /** Where the jar is kept (null: no place named). */
  declare placeId: CreationOptional<string | null>;
  declare place?: NonAttribute<Place | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Jar.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        batchId: requiredUuid(),
        productId: requiredUuid(),
        code: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        state: { type: DataTypes.STRING(10), allowNull: false },
        capacityTbsp: decimal('capacityTbsp', 8, 2),
        remainingTbsp: decimal('remainingTbsp', 8, 2),
        unsealed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        bestBy: { type: DataTypes.DATEONLY, allowNull: false },
        openedOn: { type: DataTypes.DATEONLY, allowNull: true },
        useBy: { type: DataTypes.DATEONLY, allowNull: true },
        finishedOn: { type: DataTypes.DATEONLY, allowNull: true },
        discardedOn: { type: DataTypes.DATEONLY, allowNull: true },
        givenOn: { type: DataTypes.DATEONLY, allowNull: true },
        givenTo: { type: DataTypes.STRING(80), allowNull: true },
        seal: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'checked' },
        processingId: { type: DataTypes.UUID, allowNull: true },
        placeId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jars' },
    );
  }
}
