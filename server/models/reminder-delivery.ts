import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { jsonColumn } from './json-column';
import type { User } from './user';
import type { Workshop } from './workshop';

export const REMINDER_DELIVERY_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type ReminderDeliveryStatus = (typeof REMINDER_DELIVERY_STATUSES)[number];

/**
 * One reminder digest for one person in one workshop on one day, and what became of it.
 * Written by the reminder job (server/services/reminders.ts) with raw SQL; the model reads it.
 */
export class ReminderDelivery extends Model<
  InferAttributes<ReminderDelivery>,
  InferCreationAttributes<ReminderDelivery>
> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare digestDate: string;
  declare status: CreationOptional<ReminderDeliveryStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare claimedBy: CreationOptional<string | null>;
  declare claimedAt: CreationOptional<Date | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare lastError: CreationOptional<string | null>;
  declare recheckIds: string[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ReminderDelivery.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        digestDate: { type: DataTypes.DATEONLY, allowNull: false },
        status: {
          type: DataTypes.ENUM(...REMINDER_DELIVERY_STATUSES),
          allowNull: false,
          defaultValue: 'pending',
        },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        claimedBy: { type: DataTypes.STRING(100), allowNull: true, defaultValue: null },
        claimedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        sentAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        lastError: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
        recheckIds: jsonColumn<string[]>('recheckIds', []),
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'reminder_deliveries' },
    );
  }
}
