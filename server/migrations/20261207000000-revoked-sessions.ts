import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Session tokens withdrawn by signing out before they expire, by their JWT id. A row is only
 * needed until the token would have expired; sign-out removes the expired ones.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('revoked_sessions', {
    jti: { type: DataTypes.STRING(64), primaryKey: true, allowNull: false },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
      onUpdate: 'CASCADE',
    },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('revoked_sessions', ['expires_at'], { name: 'revoked_sessions_expires_at' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('revoked_sessions');
}
