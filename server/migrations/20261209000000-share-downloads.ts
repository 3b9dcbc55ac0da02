import { DataTypes, type QueryInterface } from 'sequelize';

/** How often a share link's PDF was downloaded, beside how often its page was opened. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('report_shares', 'download_count', {
    type: DataTypes.INTEGER,
    allowNull: false,
    defaultValue: 0,
  });
  await qi.addColumn('report_shares', 'last_downloaded_at', {
    type: DataTypes.DATE(3),
    allowNull: true,
    defaultValue: null,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('report_shares', 'last_downloaded_at');
  await qi.removeColumn('report_shares', 'download_count');
}
