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
import type { Treatment } from './treatment';
import type { User } from './user';

/** A superseded version of a treatment: its data as it was, why it was corrected and by whom. */
export class TreatmentVersion extends Model<
  InferAttributes<TreatmentVersion>,
  InferCreationAttributes<TreatmentVersion>
> {
  declare id: CreationOptional<string>;
  declare treatmentId: ForeignKey<Treatment['id']>;
  declare version: number;
  declare data: TreatmentData;
  declare reason: string;
  declare changedById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare changedBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TreatmentVersion.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        version: { type: DataTypes.INTEGER, allowNull: false },
        data: jsonColumn<TreatmentData | null>('data', null),
        reason: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'treatment_versions', updatedAt: false },
    );
  }
}
