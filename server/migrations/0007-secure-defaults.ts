import { DataTypes, Op, type QueryInterface } from 'sequelize';

/**
 * Sessions ended by signing out, sign-ups waiting for their address to be confirmed, one-time links in the outbox
 * tied to their token (so the text can be redacted once the link is used or expired), and at most one open
 * invitation per brewery and address.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('revoked_sessions', {
    jti: { type: DataTypes.STRING(32), primaryKey: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable('pending_sign_ups', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    brewery_name: { type: DataTypes.STRING(80), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('pending_sign_ups', ['email']);
  await qi.addColumn('outbox_messages', 'link_token_hash', { type: DataTypes.STRING(64), allowNull: true });
  await qi.addColumn('outbox_messages', 'link_expires_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addIndex('outbox_messages', ['link_token_hash']);

  // Older databases may hold two open invitations to one address: keep the newest open.
  const [open] = (await qi.sequelize.query(
    'SELECT organisation_id, email, MAX(id) AS keep FROM invitations WHERE accepted_at IS NULL AND revoked_at IS NULL GROUP BY organisation_id, email HAVING COUNT(*) > 1',
  )) as [{ organisation_id: number; email: string; keep: number }[], unknown];
  for (const row of open) {
    await qi.bulkUpdate(
      'invitations',
      { revoked_at: new Date() },
      {
        organisation_id: row.organisation_id,
        email: row.email,
        accepted_at: null,
        revoked_at: null,
        id: { [Op.ne]: row.keep },
      },
    );
  }
  await qi.addIndex('invitations', ['organisation_id', 'email'], {
    name: 'invitations_one_open_per_address',
    unique: true,
    where: { accepted_at: null, revoked_at: null },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('invitations', 'invitations_one_open_per_address');
  await qi.removeColumn('outbox_messages', 'link_expires_at');
  await qi.removeColumn('outbox_messages', 'link_token_hash');
  await qi.dropTable('pending_sign_ups');
  await qi.dropTable('revoked_sessions');
}
