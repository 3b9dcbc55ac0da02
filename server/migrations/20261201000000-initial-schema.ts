import { DataTypes, type QueryInterface } from 'sequelize';
import { ROLES } from '@/shared/roles';
import { ACTIVITY, DECAY_TYPES, PICK_TEST } from '@/shared/schemas/finding';
import { SURVEY_PURPOSES } from '@/shared/schemas/survey';
import { STORAGE_PLACES, VEHICLE_STAGES } from '@/shared/schemas/vehicle';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/** Foundation tables: tenancy, people, vehicles, surveys, findings, photos, audit. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('workshops', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    settings: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  });
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    reminders_enabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    ...timestamps,
  });
  await qi.createTable('memberships', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    user_id: ref('users', 'CASCADE'),
    role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('memberships', ['workshop_id', 'user_id'], {
    unique: true,
    name: 'memberships_workshop_user',
  });

  await qi.createTable('invitations', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    invited_by_id: ref('users', 'SET NULL', true),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('invitations', ['workshop_id', 'email']);

  await qi.createTable('vehicles', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    created_by_id: ref('users', 'SET NULL', true),
    year: { type: DataTypes.SMALLINT, allowNull: false },
    make: { type: DataTypes.STRING(80), allowNull: false },
    model: { type: DataTypes.STRING(80), allowNull: false },
    body_plan_key: { type: DataTypes.STRING(60), allowNull: false },
    chassis_number: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    body_number: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    client_name: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    storage: { type: DataTypes.ENUM(...STORAGE_PLACES), allowNull: false, defaultValue: 'indoors' },
    stage: { type: DataTypes.ENUM(...VEHICLE_STAGES), allowNull: false, defaultValue: 'intake' },
    notes: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
    deleted_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.addIndex('vehicles', ['workshop_id', 'deleted_at']);

  await qi.createTable('vehicle_access', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    user_id: ref('users', 'CASCADE'),
    granted_by_id: ref('users', 'SET NULL', true),
    ...timestamps,
  });
  await qi.addIndex('vehicle_access', ['vehicle_id', 'user_id'], {
    unique: true,
    name: 'vehicle_access_vehicle_user',
  });

  await qi.createTable('surveys', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    inspector_id: ref('users', 'SET NULL', true),
    date: { type: DataTypes.DATEONLY, allowNull: false },
    purpose: { type: DataTypes.ENUM(...SURVEY_PURPOSES), allowNull: false },
    air_temp_c: { type: DataTypes.DECIMAL(5, 1), allowNull: true },
    relative_humidity: { type: DataTypes.DECIMAL(5, 1), allowNull: true },
    not_accessible_zones: { type: DataTypes.JSON, allowNull: false },
    not_accessible_notes: { type: DataTypes.TEXT, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('surveys', ['vehicle_id', 'date']);

  await qi.createTable('findings', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    survey_id: ref('surveys', 'CASCADE'),
    author_id: ref('users', 'SET NULL', true),
    zone_key: { type: DataTypes.STRING(60), allowNull: false },
    severity: { type: DataTypes.TINYINT, allowNull: false },
    decay_type: { type: DataTypes.ENUM(...DECAY_TYPES), allowNull: false, defaultValue: 'none' },
    insect_evidence: { type: DataTypes.JSON, allowNull: false },
    hole_diameter_mm: { type: DataTypes.DECIMAL(6, 2), allowNull: true },
    activity: { type: DataTypes.ENUM(...ACTIVITY), allowNull: false, defaultValue: 'unknown' },
    moisture: { type: DataTypes.JSON, allowNull: true },
    pick_test: { type: DataTypes.ENUM(...PICK_TEST), allowNull: false, defaultValue: 'not-done' },
    decay_depth_mm: { type: DataTypes.JSON, allowNull: false },
    affected_length_mm: { type: DataTypes.DECIMAL(8, 1), allowNull: true },
    at_joint_or_fitting: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    pin: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
    deleted_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.addIndex('findings', ['vehicle_id', 'zone_key']);
  await qi.addIndex('findings', ['survey_id']);

  await qi.createTable('photos', {
    id,
    workshop_id: ref('workshops', 'CASCADE'),
    finding_id: ref('findings', 'CASCADE'),
    uploaded_by_id: ref('users', 'SET NULL', true),
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    thumb_key: { type: DataTypes.STRING(255), allowNull: false },
    display_key: { type: DataTypes.STRING(255), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    caption: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  await qi.addIndex('photos', ['finding_id']);

  await qi.createTable('audit_entries', {
    id,
    workshop_id: ref('workshops', 'CASCADE', true),
    actor_id: ref('users', 'SET NULL', true),
    action: { type: DataTypes.STRING(60), allowNull: false },
    entity_type: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.STRING(36), allowNull: false },
    summary: { type: DataTypes.STRING(500), allowNull: false },
    changes: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_entries', ['workshop_id', 'created_at']);
  await qi.addIndex('audit_entries', ['entity_type', 'entity_id']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of [
    'audit_entries',
    'photos',
    'findings',
    'surveys',
    'vehicle_access',
    'vehicles',
    'invitations',
    'memberships',
    'users',
    'workshops',
  ])
    await qi.dropTable(t);
}
