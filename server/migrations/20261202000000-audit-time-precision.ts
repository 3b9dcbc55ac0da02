import { DataTypes, type QueryInterface } from 'sequelize';

/** Milliseconds on audit times, so entries written within the same second still list newest first. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('audit_entries', 'created_at', {
    type: DataTypes.DATE(3),
    allowNull: false,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('audit_entries', 'created_at', { type: DataTypes.DATE, allowNull: false });
}
