import { DataTypes, type QueryInterface } from 'sequelize';

/** Bottle formats per brewery, each person's unit system, and the brewery's alcohol limit. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('bottle_formats', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'organisations', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(60), allowNull: false },
    liquid_ml: { type: DataTypes.FLOAT, allowNull: false },
    headspace_ml: { type: DataTypes.FLOAT, allowNull: false },
    closure: { type: DataTypes.STRING(20), allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    max_working_pressure_bar: { type: DataTypes.FLOAT, allowNull: false },
    pressure_source: { type: DataTypes.STRING(200), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('bottle_formats', ['organisation_id', 'name'], { unique: true });
  await qi.addColumn('users', 'unit_system', { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'metric' });
  await qi.addColumn('organisations', 'abv_limit_percent', {
    type: DataTypes.FLOAT,
    allowNull: false,
    defaultValue: 0.5,
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('organisations', 'abv_limit_percent');
  await qi.removeColumn('users', 'unit_system');
  await qi.dropTable('bottle_formats');
}
