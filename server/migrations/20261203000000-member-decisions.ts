import { DataTypes, type QueryInterface } from 'sequelize';
import { DECISION_CLASSES, VERDICT_OPTIONS } from '@/shared/wood/types';

const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/** One current repair-or-replace decision per member of a vehicle; history is in audit_entries. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('member_decisions', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    workshop_id: ref('workshops', 'CASCADE'),
    vehicle_id: ref('vehicles', 'CASCADE'),
    decided_by_id: ref('users', 'SET NULL', true),
    zone_key: { type: DataTypes.STRING(60), allowNull: false },
    inputs: { type: DataTypes.JSON, allowNull: false },
    recommended_option: { type: DataTypes.ENUM(...VERDICT_OPTIONS), allowNull: false },
    recommendation_reasons: { type: DataTypes.JSON, allowNull: false },
    chosen_option: { type: DataTypes.ENUM(...VERDICT_OPTIONS), allowNull: false },
    override_reason: { type: DataTypes.TEXT, allowNull: false },
    decision_class: { type: DataTypes.ENUM(...DECISION_CLASSES), allowNull: false },
    estimated_hours: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
    labour_cost: { type: DataTypes.DECIMAL(12, 2), allowNull: false },
    material_cost: { type: DataTypes.DECIMAL(12, 2), allowNull: false },
    total_cost: { type: DataTypes.DECIMAL(12, 2), allowNull: false },
    materials: { type: DataTypes.JSON, allowNull: false },
    splice: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('member_decisions', ['vehicle_id', 'zone_key'], {
    unique: true,
    name: 'member_decisions_vehicle_zone',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('member_decisions');
}
