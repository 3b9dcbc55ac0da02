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
import type { TreatmentData } from '@/shared/schemas/treatment';
import { jsonColumn } from './json-column';
import type { TreatmentVersion } from './treatment-version';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';

/**
 * The current version of a treatment record: every field as entered is in `data`; the columns
 * beside it repeat what lists and the re-check plan query on. Corrections move the previous
 * `data` to treatment_versions; a treatment is never deleted.
 */
export class Treatment extends Model<
  InferAttributes<Treatment>,
  InferCreationAttributes<Treatment>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare recordedById: ForeignKey<User['id']> | null;
  declare version: CreationOptional<number>;
  declare data: TreatmentData;
  declare appliedAt: Date;
  declare zoneKeys: string[];
  declare method: string;
  declare targetAgent: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare recordedBy?: NonAttribute<User>;
  declare versions?: NonAttribute<TreatmentVersion[]>;

  static initModel(sequelize: Sequelize) {
    Treatment.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        data: jsonColumn<TreatmentData | null>('data', null),
        appliedAt: { type: DataTypes.DATE(3), allowNull: false },
        zoneKeys: jsonColumn<string[]>('zoneKeys', []),
        method: { type: DataTypes.STRING(30), allowNull: false },
        targetAgent: { type: DataTypes.STRING(40), allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'treatments', version: true },
    );
  }
}
