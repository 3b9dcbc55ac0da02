import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './user';
import type { Workshop } from './workshop';
import { jsonColumn } from './json-column';

/** Who changed what, when. Written in the same transaction as the change it records. */
export class AuditEntry extends Model<
  InferAttributes<AuditEntry>,
  InferCreationAttributes<AuditEntry>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']> | null;
  declare actorId: ForeignKey<User['id']> | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string;
  declare summary: string;
  declare changes: CreationOptional<Record<string, unknown> | null>;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    AuditEntry.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        action: { type: DataTypes.STRING(60), allowNull: false },
        entityType: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.STRING(36), allowNull: false },
        summary: { type: DataTypes.STRING(500), allowNull: false },
        changes: jsonColumn<Record<string, unknown> | null>('changes', null, true),
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_entries', updatedAt: false },
    );
  }
}
