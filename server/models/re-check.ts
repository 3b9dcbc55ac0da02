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
import { RECHECK_STATUSES, type RecheckStatus } from '@/shared/schemas/recheck';
import type { Finding } from './finding';
import { jsonColumn } from './json-column';
import type { Treatment } from './treatment';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';

/** One planned follow-up inspection of the zones a treatment covered. */
export class ReCheck extends Model<InferAttributes<ReCheck>, InferCreationAttributes<ReCheck>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare treatmentId: ForeignKey<Treatment['id']>;
  declare zoneKeys: string[];
  declare dueDate: string;
  declare assigneeId: ForeignKey<User['id']> | null;
  declare status: CreationOptional<RecheckStatus>;
  declare completedAt: CreationOptional<Date | null>;
  declare completedById: ForeignKey<User['id']> | null;
  declare frassCleaned: CreationOptional<boolean>;
  declare notes: CreationOptional<string>;
  declare findingId: ForeignKey<Finding['id']> | null;
  declare moveReason: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare assignee?: NonAttribute<User | null>;
  declare completedBy?: NonAttribute<User | null>;
  declare vehicle?: NonAttribute<Vehicle>;

  static initModel(sequelize: Sequelize) {
    ReCheck.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        zoneKeys: jsonColumn<string[]>('zoneKeys', []),
        dueDate: { type: DataTypes.DATEONLY, allowNull: false },
        status: {
          type: DataTypes.ENUM(...RECHECK_STATUSES),
          allowNull: false,
          defaultValue: 'pending',
        },
        completedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        frassCleaned: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        moveReason: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 're_checks', version: true },
    );
  }
}
