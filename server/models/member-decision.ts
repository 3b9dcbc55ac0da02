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
import type { DecisionInputs } from '@/shared/schemas/decision';
import {
  DECISION_CLASSES,
  VERDICT_OPTIONS,
  type CutListLine,
  type DecisionClass,
  type SpliceGeometry,
  type VerdictOption,
} from '@/shared/wood/types';
import { jsonColumn } from './json-column';
import { num } from './survey';
import type { User } from './user';
import type { Vehicle } from './vehicle';
import type { Workshop } from './workshop';

/** A DECIMAL column read as a number (the driver hands DECIMAL back as a string). */
const decimal = (field: string, precision: number, scale: number) => ({
  type: DataTypes.DECIMAL(precision, scale),
  allowNull: false,
  get(this: Model) {
    return num(this.getDataValue(field as never)) ?? 0;
  },
});

/**
 * The current repair-or-replace decision for one member (zone) of one vehicle: what was
 * measured, what the rules recommended and why, what was chosen, and the estimate for it.
 * One row per (vehicle, zone); earlier versions live in the audit trail.
 */
export class MemberDecision extends Model<
  InferAttributes<MemberDecision>,
  InferCreationAttributes<MemberDecision>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare decidedById: ForeignKey<User['id']> | null;
  declare zoneKey: string;
  declare inputs: DecisionInputs;
  declare recommendedOption: VerdictOption;
  declare recommendationReasons: string[];
  declare chosenOption: VerdictOption;
  declare overrideReason: CreationOptional<string>;
  declare decisionClass: DecisionClass;
  declare estimatedHours: number;
  declare labourCost: number;
  declare materialCost: number;
  declare totalCost: number;
  declare materials: CutListLine[];
  declare splice: SpliceGeometry | null;
  declare notes: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare decidedBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    MemberDecision.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        zoneKey: { type: DataTypes.STRING(60), allowNull: false },
        inputs: jsonColumn<DecisionInputs | null>('inputs', null),
        recommendedOption: { type: DataTypes.ENUM(...VERDICT_OPTIONS), allowNull: false },
        recommendationReasons: jsonColumn<string[]>('recommendationReasons', []),
        chosenOption: { type: DataTypes.ENUM(...VERDICT_OPTIONS), allowNull: false },
        overrideReason: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        decisionClass: { type: DataTypes.ENUM(...DECISION_CLASSES), allowNull: false },
        estimatedHours: decimal('estimatedHours', 8, 2),
        labourCost: decimal('labourCost', 12, 2),
        materialCost: decimal('materialCost', 12, 2),
        totalCost: decimal('totalCost', 12, 2),
        materials: jsonColumn<CutListLine[]>('materials', []),
        splice: jsonColumn<SpliceGeometry | null>('splice', null, true),
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'member_decisions', version: true },
    );
  }
}
