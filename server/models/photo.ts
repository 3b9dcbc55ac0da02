import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Finding } from './finding';
import type { User } from './user';
import type { Workshop } from './workshop';

/** A re-encoded photo: two renditions in the storage adapter; the original bytes are never kept. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare findingId: ForeignKey<Finding['id']>;
  declare uploadedById: ForeignKey<User['id']> | null;
  declare width: number;
  declare height: number;
  declare thumbKey: string;
  declare displayKey: string;
  declare bytes: number;
  declare caption: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Photo.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        thumbKey: { type: DataTypes.STRING(255), allowNull: false },
        displayKey: { type: DataTypes.STRING(255), allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        caption: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos' },
    );
  }
}
