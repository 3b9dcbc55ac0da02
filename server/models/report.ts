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
import type { ReportSnapshot } from '@/shared/reports/types';
import {
  REPORT_KINDS,
  REPORT_STATUSES,
  type ReportKind,
  type ReportStatus,
  type ReportSummary,
} from '@/shared/schemas/report';
import { jsonColumn } from './json-column';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';

/**
 * One generated report: its frozen inputs (`snapshot`), what the job made of them (the PDF in
 * storage under `storageKey`, its SHA-256, size and pages) and the summary the public pages show.
 * Versions count 1, 2, … per (vehicle, kind); old versions are kept.
 */
export class Report extends Model<InferAttributes<Report>, InferCreationAttributes<Report>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare kind: ReportKind;
  declare version: number;
  declare shortId: string;
  declare status: CreationOptional<ReportStatus>;
  declare progress: CreationOptional<number>;
  declare stage: CreationOptional<string>;
  declare error: CreationOptional<string | null>;
  declare sha256: CreationOptional<string | null>;
  declare byteSize: CreationOptional<number | null>;
  declare pageCount: CreationOptional<number | null>;
  declare storageKey: CreationOptional<string | null>;
  declare snapshot: ReportSnapshot;
  declare summary: CreationOptional<ReportSummary | null>;
  declare createdById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare startedAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  /** The process rendering it (config.instanceId), while rendering. */
  declare claimedBy: CreationOptional<string | null>;
  /** When that process last showed it was still at work. */
  declare heartbeatAt: CreationOptional<Date | null>;
  declare createdBy?: NonAttribute<User>;
  declare workshop?: NonAttribute<Workshop>;

  static initModel(sequelize: Sequelize) {
    Report.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        kind: { type: DataTypes.ENUM(...REPORT_KINDS), allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false },
        shortId: { type: DataTypes.CHAR(12), allowNull: false },
        status: {
          type: DataTypes.ENUM(...REPORT_STATUSES),
          allowNull: false,
          defaultValue: 'queued',
        },
        progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        stage: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        error: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
        sha256: { type: DataTypes.CHAR(64), allowNull: true, defaultValue: null },
        byteSize: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        pageCount: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        storageKey: { type: DataTypes.STRING(200), allowNull: true, defaultValue: null },
        snapshot: jsonColumn<ReportSnapshot | null>('snapshot', null),
        summary: jsonColumn<ReportSummary | null>('summary', null, true),
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
        startedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        finishedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        claimedBy: { type: DataTypes.STRING(120), allowNull: true, defaultValue: null },
        heartbeatAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
      },
      { sequelize, tableName: 'reports' },
    );
  }
}
