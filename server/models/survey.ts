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
import { SURVEY_PURPOSES, type SurveyPurpose } from '@/shared/schemas/survey';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';
import { jsonColumn } from './json-column';

export class Survey extends Model<InferAttributes<Survey>, InferCreationAttributes<Survey>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare inspectorId: ForeignKey<User['id']> | null;
  declare date: string;
  declare purpose: SurveyPurpose;
  declare airTempC: number | null;
  declare relativeHumidity: number | null;
  declare notAccessibleZones: CreationOptional<string[]>;
  declare notAccessibleNotes: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare inspector?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Survey.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        purpose: { type: DataTypes.ENUM(...SURVEY_PURPOSES), allowNull: false },
        airTempC: {
          type: DataTypes.DECIMAL(5, 1),
          allowNull: true,
          get() {
            return num(this.getDataValue('airTempC'));
          },
        },
        relativeHumidity: {
          type: DataTypes.DECIMAL(5, 1),
          allowNull: true,
          get() {
            return num(this.getDataValue('relativeHumidity'));
          },
        },
        notAccessibleZones: jsonColumn<string[]>('notAccessibleZones', []),
        notAccessibleNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'surveys' },
    );
  }
}

/** DECIMAL columns come back as strings from the driver. */
export function num(v: unknown): number | null {
  if (v == null) return null;
  const n = typeof v === 'number' ? v : Number(v);
  return Number.isFinite(n) ? n : null;
}
