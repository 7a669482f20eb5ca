import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The ingredient library: dataset ingredients (organisation_id NULL, shared and read-only) and each brewery's
 * house ingredients, a full-text index kept in step by triggers, and the record of every change.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('ingredients', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'organisations', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(200), allowNull: false },
    category: { type: DataTypes.STRING(20), allowNull: false },
    energy_kcal: { type: DataTypes.FLOAT, allowNull: true },
    carbohydrate_g: { type: DataTypes.FLOAT, allowNull: true },
    sugars_g: { type: DataTypes.FLOAT, allowNull: true },
    fibre_g: { type: DataTypes.FLOAT, allowNull: true },
    fat_g: { type: DataTypes.FLOAT, allowNull: true },
    protein_g: { type: DataTypes.FLOAT, allowNull: true },
    fermentable_share: { type: DataTypes.FLOAT, allowNull: false },
    steep_share: { type: DataTypes.FLOAT, allowNull: false },
    allergens: { type: DataTypes.TEXT, allowNull: false, defaultValue: '[]' },
    measures: { type: DataTypes.TEXT, allowNull: false, defaultValue: '[]' },
    cost_per_kg: { type: DataTypes.FLOAT, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    source_dataset: { type: DataTypes.STRING(60), allowNull: true },
    source_record: { type: DataTypes.STRING(20), allowNull: true },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('ingredients', ['organisation_id', 'name']);
  await qi.addIndex('ingredients', ['source_dataset', 'source_record'], {
    unique: true,
    where: { organisation_id: null },
  });
  await qi.sequelize.query(
    `CREATE VIRTUAL TABLE ingredient_search USING fts5(name, content='ingredients', content_rowid='id', tokenize='unicode61 remove_diacritics 2')`,
  );
  await qi.sequelize.query(`CREATE TRIGGER ingredients_ai AFTER INSERT ON ingredients BEGIN
    INSERT INTO ingredient_search(rowid, name) VALUES (new.id, new.name); END`);
  await qi.sequelize.query(`CREATE TRIGGER ingredients_ad AFTER DELETE ON ingredients BEGIN
    INSERT INTO ingredient_search(ingredient_search, rowid, name) VALUES ('delete', old.id, old.name); END`);
  await qi.sequelize.query(`CREATE TRIGGER ingredients_au AFTER UPDATE OF name ON ingredients BEGIN
    INSERT INTO ingredient_search(ingredient_search, rowid, name) VALUES ('delete', old.id, old.name);
    INSERT INTO ingredient_search(rowid, name) VALUES (new.id, new.name); END`);
  await qi.createTable('ingredient_changes', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    ingredient_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'ingredients', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    action: { type: DataTypes.STRING(20), allowNull: false },
    changes: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('ingredient_changes', ['ingredient_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('ingredient_changes');
  await qi.sequelize.query('DROP TABLE ingredient_search');
  await qi.dropTable('ingredients');
}
