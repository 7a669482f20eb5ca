import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A brewery's short names for dataset ingredients ("Shortbread cookies" for the dataset's long description), and the
 * currency its ingredient costs are kept in.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('organisations', 'currency', { type: DataTypes.STRING(3), allowNull: false, defaultValue: 'USD' });
  await qi.createTable('ingredient_display_names', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'organisations', key: 'id' },
      onDelete: 'CASCADE',
    },
    ingredient_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'ingredients', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(80), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('ingredient_display_names', ['organisation_id', 'ingredient_id'], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('ingredient_display_names');
  await qi.removeColumn('organisations', 'currency');
}
