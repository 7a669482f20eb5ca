import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

/** Recipes, each save a new version, and the tastings of the development log. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('recipes', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'organisations', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(100), allowNull: false },
    flavour_notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
    current_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('recipes', ['organisation_id', 'name']);
  await qi.createTable('recipe_versions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recipe_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'recipes', key: 'id' },
      onDelete: 'CASCADE',
    },
    number: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(100), allowNull: false },
    flavour_notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    content: { type: DataTypes.TEXT, allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    created_by_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    ...timestamps,
  });
  await qi.addIndex('recipe_versions', ['recipe_id', 'number'], { unique: true });
  await qi.createTable('tastings', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recipe_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'recipes', key: 'id' },
      onDelete: 'CASCADE',
    },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    tasted_on: { type: DataTypes.STRING(10), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    sweetness: { type: DataTypes.INTEGER, allowNull: false },
    sourness: { type: DataTypes.INTEGER, allowNull: false },
    fizz: { type: DataTypes.INTEGER, allowNull: false },
    flavour: { type: DataTypes.INTEGER, allowNull: false },
    sugar_addition: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('tastings', ['recipe_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('tastings');
  await qi.dropTable('recipe_versions');
  await qi.dropTable('recipes');
}
