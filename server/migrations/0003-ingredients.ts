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
  if (qi.sequelize.getDialect() === 'postgres') await postgresSearch(qi);
  else await sqliteSearch(qi);
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

/** SQLite: an FTS5 table over the names (diacritics folded), kept in step by triggers. */
async function sqliteSearch(qi: QueryInterface): Promise<void> {
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
}

/**
 * PostgreSQL: a tsvector column of the name (the 'simple' configuration, diacritics folded by unaccent, as FTS5's
 * unicode61 tokenizer does on SQLite), kept by a trigger, under a GIN index.
 */
async function postgresSearch(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('CREATE EXTENSION IF NOT EXISTS unaccent');
  await qi.sequelize.query('ALTER TABLE ingredients ADD COLUMN search_vector tsvector');
  await qi.sequelize.query(`CREATE FUNCTION ingredients_search_vector() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN NEW.search_vector := to_tsvector('simple', unaccent(NEW.name)); RETURN NEW; END $$`);
  await qi.sequelize.query(`CREATE TRIGGER ingredients_search BEFORE INSERT OR UPDATE OF name ON ingredients
    FOR EACH ROW EXECUTE FUNCTION ingredients_search_vector()`);
  await qi.sequelize.query('CREATE INDEX ingredients_search_vector ON ingredients USING GIN (search_vector)');
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('ingredient_changes');
  if (qi.sequelize.getDialect() === 'postgres') {
    await qi.sequelize.query('DROP TRIGGER ingredients_search ON ingredients');
    await qi.sequelize.query('DROP FUNCTION ingredients_search_vector()');
  } else await qi.sequelize.query('DROP TABLE ingredient_search');
  await qi.dropTable('ingredients');
}
