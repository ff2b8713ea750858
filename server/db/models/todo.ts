import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { BatchPlan, TodoKind } from '../../../shared/schemas/todos';
import { requiredUuid, uuidKey } from './columns';

export class Todo extends Model<InferAttributes<Todo>, InferCreationAttributes<Todo>> {
  declare id: CreationOptional<string>;
  declare householdId: string;
  declare title: string;
  declare notes: CreationOptional<string>;
  declare dueOn: CreationOptional<string | null>;
  declare assigneeId: CreationOptional<string | null>;
  declare done: CreationOptional<boolean>;
  declare doneAt: CreationOptional<Date | null>;
  declare position: number;
  declare kind: CreationOptional<TodoKind>;
  declare productId: CreationOptional<string | null>;
  declare batchPlan: CreationOptional<BatchPlan | null>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Todo.init(
      {
        id: uuidKey(),
        householdId: requiredUuid(),
        title: { type: DataTypes.STRING(200), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        dueOn: { type: DataTypes.DATEONLY, allowNull: true },
        assigneeId: { type: DataTypes.UUID, allowNull: true },
        done: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        doneAt: { type: DataTypes.DATE, allowNull: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'plain' },
        productId: { type: DataTypes.UUID, allowNull: true },
        batchPlan: { type: DataTypes.JSONB, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'todos' },
    );
  }
}
