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
import type { Report } from './report';
import type { User } from './user';
import type { Workshop } from './workshop';

/** A link to one report for someone without an account. Only the token's SHA-256 is stored. */
export class ReportShare extends Model<
  InferAttributes<ReportShare>,
  InferCreationAttributes<ReportShare>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare reportId: ForeignKey<Report['id']>;
  declare tokenHash: string;
  declare recipientEmail: string | null;
  declare message: string;
  declare expiresAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare revokedById: ForeignKey<User['id']> | null;
  declare viewCount: CreationOptional<number>;
  declare lastViewedAt: CreationOptional<Date | null>;
  declare downloadCount: CreationOptional<number>;
  declare lastDownloadedAt: CreationOptional<Date | null>;
  declare emailedAt: CreationOptional<Date | null>;
  declare createdById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare report?: NonAttribute<Report>;
  declare createdBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    ReportShare.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        recipientEmail: { type: DataTypes.STRING(254), allowNull: true },
        message: { type: DataTypes.TEXT, allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        viewCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastViewedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        downloadCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastDownloadedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        emailedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'report_shares' },
    );
  }
}
