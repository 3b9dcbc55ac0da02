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
import { ACTIVITY, DECAY_TYPES, PICK_TEST, type INSECT_EVIDENCE } from '@/shared/schemas/finding';
import type { Photo } from './photo';
import type { Survey } from './survey';
import { num } from './survey';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';
import { jsonColumn } from './json-column';

export type MoistureReading = {
  meterReading: number;
  woodTempC: number | null;
  species: string | null;
};
export type DecayDepth = { top: number; bottom: number; left: number; right: number };
export type Pin = { view: string; x: number; y: number };

export class Finding extends Model<InferAttributes<Finding>, InferCreationAttributes<Finding>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare surveyId: ForeignKey<Survey['id']>;
  declare authorId: ForeignKey<User['id']> | null;
  declare zoneKey: string;
  declare severity: number;
  declare decayType: (typeof DECAY_TYPES)[number];
  declare insectEvidence: CreationOptional<(typeof INSECT_EVIDENCE)[number][]>;
  declare holeDiameterMm: number | null;
  declare activity: (typeof ACTIVITY)[number];
  declare moisture: MoistureReading | null;
  declare pickTest: (typeof PICK_TEST)[number];
  declare decayDepthMm: DecayDepth;
  declare affectedLengthMm: number | null;
  declare atJointOrFitting: boolean;
  declare pin: Pin | null;
  declare notes: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare deletedAt: CreationOptional<Date | null>;
  declare photos?: NonAttribute<Photo[]>;
  declare survey?: NonAttribute<Survey>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Finding.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        zoneKey: { type: DataTypes.STRING(60), allowNull: false },
        severity: { type: DataTypes.TINYINT, allowNull: false },
        decayType: { type: DataTypes.ENUM(...DECAY_TYPES), allowNull: false, defaultValue: 'none' },
        insectEvidence: jsonColumn<string[]>('insectEvidence', []),
        holeDiameterMm: {
          type: DataTypes.DECIMAL(6, 2),
          allowNull: true,
          get() {
            return num(this.getDataValue('holeDiameterMm'));
          },
        },
        activity: { type: DataTypes.ENUM(...ACTIVITY), allowNull: false, defaultValue: 'unknown' },
        moisture: jsonColumn<MoistureReading | null>('moisture', null, true),
        pickTest: {
          type: DataTypes.ENUM(...PICK_TEST),
          allowNull: false,
          defaultValue: 'not-done',
        },
        decayDepthMm: jsonColumn<DecayDepth>('decayDepthMm', {
          top: 0,
          bottom: 0,
          left: 0,
          right: 0,
        }),
        affectedLengthMm: {
          type: DataTypes.DECIMAL(8, 1),
          allowNull: true,
          get() {
            return num(this.getDataValue('affectedLengthMm'));
          },
        },
        atJointOrFitting: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        pin: jsonColumn<Pin | null>('pin', null, true),
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        deletedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'findings', paranoid: true, version: true },
    );
  }
}
