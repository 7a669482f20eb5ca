import { DataTypes, type QueryInterface } from 'sequelize';

/** Review of recipe versions for production, and each person's choice of review e-mails. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('recipes', 'submitted_version', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addColumn('recipes', 'approved_version', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addColumn('users', 'notify_reviews', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
  await qi.createTable('recipe_reviews', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recipe_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'recipes', key: 'id' },
      onDelete: 'CASCADE',
    },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    action: { type: DataTypes.STRING(20), allowNull: false },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    override_reason: { type: DataTypes.TEXT, allowNull: true },
    self_approved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('recipe_reviews', ['recipe_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('recipe_reviews');
  await qi.removeColumn('users', 'notify_reviews');
  await qi.removeColumn('recipes', 'approved_version');
  await qi.removeColumn('recipes', 'submitted_version');
}
