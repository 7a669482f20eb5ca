import { DataTypes, type Model } from 'sequelize';

/**
 * A TEXT column holding JSON: parsed on read, stringified on write. SQLite has no JSON type Sequelize maps
 * reliably, so every structured column (allergens, measures, recipe content, …) goes through here.
 */
export function jsonColumn<T>(field: string, options: { allowNull?: boolean; empty?: string } = {}) {
  const { allowNull = false, empty = 'null' } = options;
  return {
    type: DataTypes.TEXT,
    allowNull,
    get(this: Model): T {
      const raw = this.getDataValue(field as never) as string | null;
      return JSON.parse(raw ?? empty) as T;
    },
    set(this: Model, value: T) {
      this.setDataValue(field as never, (value === null ? null : JSON.stringify(value)) as never);
    },
  };
}
