import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { STORAGE_PLACES, VEHICLE_STAGES, type VehicleStage } from '@/shared/schemas/vehicle';
import type { User } from './user';
import type { Workshop } from './workshop';

export class Vehicle extends Model<InferAttributes<Vehicle>, InferCreationAttributes<Vehicle>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare createdById: ForeignKey<User['id']> | null;
  declare year: number;
  declare make: string;
  declare model: string;
  declare bodyPlanKey: string;
  declare chassisNumber: CreationOptional<string>;
  declare bodyNumber: CreationOptional<string>;
  declare clientName: CreationOptional<string>;
  declare storage: CreationOptional<(typeof STORAGE_PLACES)[number]>;
  declare stage: CreationOptional<VehicleStage>;
  declare notes: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare deletedAt: CreationOptional<Date | null>;

  static initModel(sequelize: Sequelize) {
    Vehicle.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        year: { type: DataTypes.SMALLINT, allowNull: false },
        make: { type: DataTypes.STRING(80), allowNull: false },
        model: { type: DataTypes.STRING(80), allowNull: false },
        bodyPlanKey: { type: DataTypes.STRING(60), allowNull: false },
        chassisNumber: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        bodyNumber: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        clientName: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        storage: {
          type: DataTypes.ENUM(...STORAGE_PLACES),
          allowNull: false,
          defaultValue: 'indoors',
        },
        stage: {
          type: DataTypes.ENUM(...VEHICLE_STAGES),
          allowNull: false,
          defaultValue: 'intake',
        },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        deletedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'vehicles', paranoid: true, version: true },
    );
  }
}
