import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/**
 * Generated reports (the PDF lives in storage; the row keeps its inputs, digest and summary) and
 * the share links made for them (only the SHA-256 of a link's token is stored).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('reports', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    kind: { type: DataTypes.ENUM('repair-scope', 'condition'), allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false },
    short_id: { type: DataTypes.CHAR(12), allowNull: false },
    status: {
      type: DataTypes.ENUM('queued', 'rendering', 'ready', 'failed'),
      allowNull: false,
      defaultValue: 'queued',
    },
    progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    stage: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    error: { type: DataTypes.TEXT, allowNull: true },
    sha256: { type: DataTypes.CHAR(64), allowNull: true },
    byte_size: { type: DataTypes.INTEGER, allowNull: true },
    page_count: { type: DataTypes.INTEGER, allowNull: true },
    storage_key: { type: DataTypes.STRING(200), allowNull: true },
    snapshot: { type: DataTypes.JSON, allowNull: false },
    summary: { type: DataTypes.JSON, allowNull: true },
    created_by_id: ref('users', 'SET NULL', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
    started_at: { type: DataTypes.DATE(3), allowNull: true },
    finished_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await qi.addIndex('reports', ['vehicle_id', 'kind', 'version'], {
    unique: true,
    name: 'reports_vehicle_kind_version',
  });
  await qi.addIndex('reports', ['short_id'], { unique: true, name: 'reports_short_id' });
  await qi.addIndex('reports', ['sha256'], { name: 'reports_sha256' });
  await qi.addIndex('reports', ['workshop_id', 'status'], { name: 'reports_workshop_status' });

  await qi.createTable('report_shares', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    workshop_id: ref('workshops', 'CASCADE'),
    report_id: ref('reports', 'CASCADE'),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false },
    recipient_email: { type: DataTypes.STRING(254), allowNull: true },
    message: { type: DataTypes.TEXT, allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_by_id: ref('users', 'SET NULL', true),
    view_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_viewed_at: { type: DataTypes.DATE(3), allowNull: true },
    emailed_at: { type: DataTypes.DATE(3), allowNull: true },
    created_by_id: ref('users', 'SET NULL', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('report_shares', ['token_hash'], {
    unique: true,
    name: 'report_shares_token_hash',
  });
  await qi.addIndex('report_shares', ['report_id', 'created_at'], {
    name: 'report_shares_report_created',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('report_shares');
  await qi.dropTable('reports');
}
