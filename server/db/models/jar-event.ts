import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { JarState } from '../../../shared/domain';
import { requiredUuid, uuidKey } from './columns';

export const JAR_EVENT_KINDS = [
  'filled',
  'unsealed',
  'opened',
  'finished',
  'discarded',
  'given',
  'restored',
  'seal-checked',
  'reprocessed',
  'moved',
] as const;
export type JarEventKind = (typeof JAR_EVENT_KINDS)[number];

export interface JarBefore {
  state: JarState;
  openedOn: string | null;
  useBy: string | null;
  finishedOn: string | null;
  discardedOn: string | null;
  /** Absent from snapshots written before gifts existed; those jars were not given. */
  givenOn?: string | null;
  givenTo?: string | null;
  remainingTbsp: number;
}

/** A move's place names (null: no place), as they were called then. */
export interface PlaceMove {
  from: string | null;
  to: string | null;
}

export class JarEvent extends Model<InferAttributes<JarEvent>, InferCreationAttributes<JarEvent>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare jarId: string;
  declare batchId: string;
  declare kind: JarEventKind;
  declare userId: string | null;
  declare happenedOn: string;
  /** A 'restored' event names the open, finish, discard or gift it reverses. */
  declare undoesEventId: CreationOptional<string | null>;
  /** The jar's fields before an open, finish, discard or gift, so an undo puts back exactly those. */
  declare stateBefore: CreationOptional<JarBefore | null>;
  declare placeMove: CreationOptional<PlaceMove | null>;
  /** A 'given' event: whom the jar went to, when the giver said. */
  declare givenTo: CreationOptional<string | null>;
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
        undoesEventId: { type: DataTypes.UUID, allowNull: true },
        stateBefore: { type: DataTypes.JSONB, allowNull: true },
        placeMove: { type: DataTypes.JSONB, allowNull: true },
        givenTo: { type: DataTypes.STRING(80), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jar_events', updatedAt: false },
    );
  }
}
