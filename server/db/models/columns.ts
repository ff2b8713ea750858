import { DataTypes, type ModelAttributeColumnOptions } from 'sequelize';

/** A NUMERIC column read back as a JavaScript number (pg returns NUMERIC as a string to keep precision). */
export function decimal(
  name: string,
  precision: number,
  scale: number,
  allowNull = false,
): ModelAttributeColumnOptions {
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull,
    get(this: { getDataValue(key: string): unknown }) {
      const value = this.getDataValue(name);
      return value === null || value === undefined ? value : Number(value);
    },
  };
}

// Functions, not shared objects: Model.init writes each column's `field` into its definition object,
// so one object shared by householdId and productId would map both to household_id.
export const uuidKey = () => ({ type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true }) as const;
export const requiredUuid = () => ({ type: DataTypes.UUID, allowNull: false }) as const;
