import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A tasting is of the version that was tasted; its sugar addition may create another. Until now the tasting kept
 * only the version it created: for those, the version tasted was the one before.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('tastings', 'created_version', { type: DataTypes.INTEGER, allowNull: true });
  await qi.sequelize.query(
    'UPDATE tastings SET created_version = version_number, version_number = version_number - 1 WHERE sugar_addition IS NOT NULL AND version_number > 1',
  );
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('UPDATE tastings SET version_number = created_version WHERE created_version IS NOT NULL');
  await qi.removeColumn('tastings', 'created_version');
}
