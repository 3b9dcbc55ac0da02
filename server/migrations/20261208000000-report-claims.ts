import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Which process is rendering a report, and when it last said so. A rendering row whose heartbeat
 * has gone quiet was left by a stopped process and is offered again; a live one is left alone,
 * so several server processes can share one database.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('reports', 'claimed_by', {
    type: DataTypes.STRING(120),
    allowNull: true,
    defaultValue: null,
  });
  await qi.addColumn('reports', 'heartbeat_at', {
    type: DataTypes.DATE(3),
    allowNull: true,
    defaultValue: null,
  });
  await qi.addIndex('reports', ['status', 'heartbeat_at'], { name: 'reports_status_heartbeat' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('reports', 'reports_status_heartbeat');
  await qi.removeColumn('reports', 'heartbeat_at');
  await qi.removeColumn('reports', 'claimed_by');
}
