import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (table: string) => ({
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete: 'CASCADE',
  onUpdate: 'CASCADE',
});

/**
 * One row per reminder digest (user, workshop, day). The unique key is what makes enqueueing
 * from several server instances at once produce a single digest.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('reminder_deliveries', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    user_id: ref('users'),
    workshop_id: ref('workshops'),
    digest_date: { type: DataTypes.DATEONLY, allowNull: false },
    status: {
      type: DataTypes.ENUM('pending', 'sending', 'sent', 'failed'),
      allowNull: false,
      defaultValue: 'pending',
    },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    claimed_by: { type: DataTypes.STRING(100), allowNull: true },
    claimed_at: { type: DataTypes.DATE(3), allowNull: true },
    sent_at: { type: DataTypes.DATE(3), allowNull: true },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    recheck_ids: { type: DataTypes.JSON, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('reminder_deliveries', ['user_id', 'workshop_id', 'digest_date'], {
    unique: true,
    name: 'reminder_deliveries_user_workshop_day',
  });
  await qi.addIndex('reminder_deliveries', ['status', 'next_attempt_at'], {
    name: 'reminder_deliveries_status_next',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('reminder_deliveries');
}
