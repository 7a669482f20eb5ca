import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const ref = (model: string, allowNull = false, onDelete = 'CASCADE') => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model, key: 'id' },
  onDelete,
});
const person = () => ref('users', true, 'SET NULL');

/**
 * Production and trial batches and everything the floor records against them: readings, step sign-offs, ingredient
 * lots, deviations and the owner's decisions, all append-only. Attachments may now belong to a reading (a lab's ABV
 * report) instead of an ingredient; the table is rebuilt to make `ingredient_id` optional, which nothing references.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('organisations', 'lot_prefix', {
    type: DataTypes.STRING(8),
    allowNull: false,
    defaultValue: 'LOT',
  });
  await qi.createTable('batches', {
    id,
    organisation_id: ref('organisations'),
    recipe_id: ref('recipes'),
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    lot_code: { type: DataTypes.STRING(40), allowNull: false },
    trial: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    state: { type: DataTypes.STRING(20), allowNull: false },
    batch_kind: { type: DataTypes.STRING(20), allowNull: false },
    batch_value: { type: DataTypes.FLOAT, allowNull: false },
    frozen: { type: DataTypes.TEXT, allowNull: false },
    started_by_id: person(),
    ...stamps,
  });
  await qi.addIndex('batches', ['organisation_id', 'lot_code'], { unique: true, name: 'batches_lot_code_unique' });
  await qi.addIndex('batches', ['organisation_id', 'state', 'id']);
  await qi.addIndex('batches', ['recipe_id']);
  await qi.createTable('batch_readings', {
    id,
    batch_id: ref('batches'),
    kind: { type: DataTypes.STRING(20), allowNull: false },
    value: { type: DataTypes.FLOAT, allowNull: false },
    temp_c: { type: DataTypes.FLOAT, allowNull: true },
    stage: { type: DataTypes.STRING(20), allowNull: false },
    source: { type: DataTypes.STRING(20), allowNull: true },
    taken_at: { type: DataTypes.DATE, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    level: { type: DataTypes.STRING(10), allowNull: false },
    message: { type: DataTypes.TEXT, allowNull: false },
    predicted_gauge_bar: { type: DataTypes.FLOAT, allowNull: true },
    corrects_id: ref('batch_readings', true, 'SET NULL'),
    user_id: person(),
    ...stamps,
  });
  await qi.addIndex('batch_readings', ['batch_id', 'id']);
  await qi.createTable('batch_step_signoffs', {
    id,
    batch_id: ref('batches'),
    step_number: { type: DataTypes.INTEGER, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    user_id: person(),
    ...stamps,
  });
  await qi.addIndex('batch_step_signoffs', ['batch_id', 'step_number'], { unique: true, name: 'batch_step_once' });
  await qi.createTable('batch_ingredient_lots', {
    id,
    batch_id: ref('batches'),
    ingredient_id: ref('ingredients', true, 'SET NULL'),
    ingredient_name: { type: DataTypes.STRING(200), allowNull: false },
    supplier: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    supplier_lot: { type: DataTypes.STRING(100), allowNull: false },
    quantity_text: { type: DataTypes.STRING(60), allowNull: false },
    quantity_value: { type: DataTypes.FLOAT, allowNull: false },
    quantity_unit: { type: DataTypes.STRING(4), allowNull: false },
    corrects_id: ref('batch_ingredient_lots', true, 'SET NULL'),
    user_id: person(),
    ...stamps,
  });
  await qi.addIndex('batch_ingredient_lots', ['supplier_lot']);
  await qi.addIndex('batch_ingredient_lots', ['batch_id']);
  await qi.createTable('batch_deviations', {
    id,
    batch_id: ref('batches'),
    what_happened: { type: DataTypes.TEXT, allowNull: false },
    action_taken: { type: DataTypes.TEXT, allowNull: false },
    closes_reading_id: ref('batch_readings', true, 'SET NULL'),
    corrects_id: ref('batch_deviations', true, 'SET NULL'),
    user_id: person(),
    ...stamps,
  });
  await qi.addIndex('batch_deviations', ['batch_id']);
  await qi.createTable('batch_decisions', {
    id,
    batch_id: ref('batches'),
    decision: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    override_reason: { type: DataTypes.TEXT, allowNull: true },
    user_id: person(),
    ...stamps,
  });
  await qi.addIndex('batch_decisions', ['batch_id']);

  await qi.createTable('attachments_next', {
    id,
    organisation_id: ref('organisations'),
    ingredient_id: ref('ingredients', true),
    batch_reading_id: ref('batch_readings', true),
    uploaded_by_id: person(),
    stored_name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    original_name: { type: DataTypes.STRING(200), allowNull: false },
    mime_type: { type: DataTypes.STRING(40), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    ...stamps,
  });
  await qi.sequelize.query(
    `INSERT INTO attachments_next (id, organisation_id, ingredient_id, batch_reading_id, uploaded_by_id, stored_name, original_name, mime_type, size_bytes, created_at, updated_at)
     SELECT id, organisation_id, ingredient_id, NULL, uploaded_by_id, stored_name, original_name, mime_type, size_bytes, created_at, updated_at FROM attachments`,
  );
  await qi.dropTable('attachments');
  await qi.renameTable('attachments_next', 'attachments');
  await qi.addIndex('attachments', ['ingredient_id']);
  await qi.addIndex('attachments', ['batch_reading_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('DELETE FROM attachments WHERE ingredient_id IS NULL');
  await qi.removeColumn('attachments', 'batch_reading_id');
  for (const table of [
    'batch_decisions',
    'batch_deviations',
    'batch_ingredient_lots',
    'batch_step_signoffs',
    'batch_readings',
    'batches',
  ]) {
    await qi.dropTable(table);
  }
  await qi.removeColumn('organisations', 'lot_prefix');
}
