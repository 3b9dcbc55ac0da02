import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});
const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};

/**
 * Treatments (the current version of each record, earlier versions kept in treatment_versions)
 * and the re-checks they plan.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('treatments', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    recorded_by_id: ref('users', 'SET NULL', true),
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    data: { type: DataTypes.JSON, allowNull: false },
    applied_at: { type: DataTypes.DATE(3), allowNull: false },
    zone_keys: { type: DataTypes.JSON, allowNull: false },
    method: { type: DataTypes.STRING(30), allowNull: false },
    target_agent: { type: DataTypes.STRING(40), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('treatments', ['vehicle_id', 'applied_at']);

  await qi.createTable('treatment_versions', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    treatment_id: ref('treatments', 'CASCADE'),
    version: { type: DataTypes.INTEGER, allowNull: false },
    data: { type: DataTypes.JSON, allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    changed_by_id: ref('users', 'SET NULL', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('treatment_versions', ['treatment_id', 'version'], {
    unique: true,
    name: 'treatment_versions_treatment_version',
  });

  await qi.createTable('re_checks', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    treatment_id: ref('treatments', 'CASCADE'),
    zone_keys: { type: DataTypes.JSON, allowNull: false },
    due_date: { type: DataTypes.DATEONLY, allowNull: false },
    assignee_id: ref('users', 'SET NULL', true),
    status: {
      type: DataTypes.ENUM('pending', 'clean', 'fresh-evidence'),
      allowNull: false,
      defaultValue: 'pending',
    },
    completed_at: { type: DataTypes.DATE(3), allowNull: true },
    completed_by_id: ref('users', 'SET NULL', true),
    frass_cleaned: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    finding_id: ref('findings', 'SET NULL', true),
    move_reason: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('re_checks', ['workshop_id', 'status', 'due_date'], {
    name: 're_checks_workshop_status_due',
  });
  await qi.addIndex('re_checks', ['assignee_id', 'status', 'due_date'], {
    name: 're_checks_assignee_status_due',
  });
  await qi.addIndex('re_checks', ['vehicle_id', 'due_date']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('re_checks');
  await qi.dropTable('treatment_versions');
  await qi.dropTable('treatments');
}
