import { DataTypes, type Model } from 'sequelize';

/**
 * A column holding JSON: TEXT on SQLite, JSONB on PostgreSQL (migration 0016). Written as JSON text, which
 * PostgreSQL parses into JSONB; read back as the parsed value, whichever the driver gives (SQLite's text or
 * node-postgres's already-parsed JSONB). Every structured column (allergens, measures, recipe content, …) goes
 * through here.
 */
export function jsonColumn<T>(field: string, options: { allowNull?: boolean; empty?: string } = {}) {
  const { allowNull = false, empty = 'null' } = options;
  return {
    type: DataTypes.TEXT,
    allowNull,
    get(this: Model): T {
      const raw = this.getDataValue(field as never) as unknown;
      if (raw === null || raw === undefined) return JSON.parse(empty) as T;
      return (typeof raw === 'string' ? JSON.parse(raw) : raw) as T;
    },
    set(this: Model, value: T) {
      this.setDataValue(field as never, (value === null ? null : JSON.stringify(value)) as never);
    },
  };
}
