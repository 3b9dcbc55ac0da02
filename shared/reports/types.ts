/**
 * Types of the report model (pure; shared/reports/index.ts exports the builders). A report is
 * built in two steps: the server collects a `ReportSnapshot` (the API's own response shapes,
 * frozen at generation time and stored with the report), then `buildRepairScope()` /
 * `buildConditionReport()` turn it into the model the PDF renderer and the share page draw.
 * The buyer's condition report is derived from the repair scope, so it can never leave out a
 * structural item the scope contains.
 */
import type { StructuralClass, SpeciesKey, TradeName } from '../body-plans/schema';
import type { DecisionResponse } from '../schemas/decision';
import type { FindingResponse } from '../schemas/finding';
import type { RecheckResponse, ZoneState, ZoneStateResponse } from '../schemas/recheck';
import type { SurveyResponse } from '../schemas/survey';
import type { TreatmentResponse } from '../schemas/treatment';
import type { VehicleResponse } from '../schemas/vehicle';
import type { WorkshopSettings } from '../schemas/workshop';
import type { TreatmentCaution } from '../treatments/cautions';
import type { CutListLine, DecisionClass, VerdictOption } from '../wood/types';

import type { ConditionSummary, PaperSize, ReportKind } from '../schemas/report';

export { REPORT_KINDS, PAPER_SIZES, type ReportKind, type PaperSize } from '../schemas/report';

/** Everything a report is made from, as the API answers it, frozen when generation starts. */
export interface ReportSnapshot {
  kind: ReportKind;
  /** ISO timestamp of generation. */
  generatedAt: string;
  generatedByName: string;
  workshop: { id: string; name: string; settings: WorkshopSettings };
  vehicle: VehicleResponse;
  /** All surveys of the vehicle, newest first. */
  surveys: SurveyResponse[];
  /** Open (not deleted) findings, every survey. */
  findings: FindingResponse[];
  decisions: DecisionResponse[];
  /** Every treatment (current version), oldest first. */
  treatments: TreatmentResponse[];
  rechecks: RecheckResponse[];
  /** Every zone of the vehicle's body plan. */
  zoneStates: ZoneStateResponse[];
}

/** One member in the Structural / Cosmetic lists (from its member decision). */
export interface ScopeItem {
  zoneKey: string;
  zoneLabel: string; // 'Left sill'
  tradeName: TradeName;
  tradeLabel: string; // 'Sill'
  structuralClass: StructuralClass;
  assembly: string | null;
  /** The zone's open findings in plain words, worst first: 'Severity 3, brown rot, frass (powder), active'. */
  findings: string[];
  worstSeverity: number;
  verdict: VerdictOption;
  verdictLabel: string;
  /** The recommendation's reasons, plus the override reason when the chosen option differs. */
  reasons: string[];
  decisionClass: DecisionClass;
  hours: number;
  labourCost: number;
  materialCost: number;
  totalCost: number;
  boardFeet: number; // with waste
  species: SpeciesKey[];
  /** Photo ids of the zone's open findings (for the appendix; each photo appears there once). */
  photoIds: string[];
}

/** A zone on the Monitor list: under treatment or watched, with its re-check plan. */
export interface MonitorItem {
  zoneKey: string;
  zoneLabel: string;
  state: ZoneState;
  stateLabel: string;
  flagged: boolean;
  reason: string;
  /** Pending re-checks of the zone, soonest first. */
  nextRechecks: { dueDate: string; overdue: boolean }[];
  /** Clean re-checks done so far / needed by the workshop's clearance rule. */
  cleanRechecks: number;
  cleanRechecksNeeded: number;
  /** The member decision when one exists and is classed monitor. */
  decision: ScopeItem | null;
}

export interface ScopeTotals {
  hours: number;
  labourCost: number;
  materialCost: number;
  totalCost: number;
  structural: { hours: number; totalCost: number; count: number };
  cosmetic: { hours: number; totalCost: number; count: number };
  /** Decisions classed monitor (keeping a member still costs an inspection's hours). */
  monitor: { hours: number; totalCost: number; count: number };
  boardFeetBySpecies: { species: SpeciesKey; label: string; boardFeet: number; cost: number }[];
  currency: string;
}

export type CutListRow = CutListLine & { zoneLabel: string; speciesLabel: string };

/** One step of the order of work, computed from the zones in the scope (rules in work-order.ts). */
export interface WorkStep {
  key: string; // rule key, e.g. 'primary-frame'
  title: string;
  why: string;
  zoneLabels: string[];
}

export interface TreatmentHistoryRow {
  appliedAt: string;
  applicatorName: string;
  licenceNumber: string;
  productName: string;
  registrationNumber: string;
  activeIngredient: string;
  concentration: string;
  method: string; // label
  target: string; // label
  zoneLabels: string[];
  quantity: string; // '2.5 L'
  reentryHours: number;
  ppe: string[];
  version: number; // > 1 when corrected
}

export interface NotInspectedItem {
  /** Survey date the area could not be reached on. */
  date: string;
  /** A zone label, or the survey's free-text note. */
  what: string;
}

export type ReportCaution = Omit<TreatmentCaution, 'methods'>;

export {
  CONDITION_GRADES,
  type ConditionGrade,
  type ConditionSummary,
  type ReportSummary,
} from '../schemas/report';

export interface ReportCover {
  title: string;
  workshopName: string;
  vehicleTitle: string; // '1927 Aldermoor Fourteen Tourer'
  chassisNumber: string;
  bodyNumber: string;
  clientName: string;
  bodyPlanName: string;
  inspectorName: string | null; // inspector of the latest survey
  latestSurveyDate: string | null;
  generatedAt: string;
  generatedByName: string;
}

/** The repair scope: what the owner budgets from. */
export interface RepairScope {
  cover: ReportCover;
  condition: ConditionSummary;
  structural: ScopeItem[];
  cosmetic: ScopeItem[];
  monitor: MonitorItem[];
  /** Zones with open findings of severity ≥ 2 and no decision: listed so nothing is silently dropped. */
  undecided: { zoneKey: string; zoneLabel: string; worstSeverity: number; findings: string[] }[];
  totals: ScopeTotals;
  cutList: CutListRow[];
  workOrder: WorkStep[];
  treatments: TreatmentHistoryRow[];
  notInspected: NotInspectedItem[];
  /** The limits of a visual, non-destructive survey. */
  limitations: string[];
  cautions: ReportCaution[];
  /** Zone key → worst open severity, for the diagram (every zone of the plan). */
  zoneSeverity: Record<string, number>;
  /** Zone key → number of open findings (zones without any are left out). */
  zoneFindingCount: Record<string, number>;
  bodyPlanKey: string;
  units: WorkshopSettings['units'];
  paperSize: PaperSize;
}

/** The buyer's condition report: plain language, one or two pages before the appendix. */
export interface ConditionReport {
  cover: ReportCover;
  condition: ConditionSummary;
  /** Every structural item of the scope, in the same order: never fewer. */
  mustFix: { zoneLabel: string; verdictLabel: string; plain: string }[];
  infestations: { zoneLabel: string; stateLabel: string; plain: string }[];
  notInspected: NotInspectedItem[];
  limitations: string[];
  cautions: ReportCaution[];
  /** Plain sentences for the summary box. */
  headline: string[];
  zoneSeverity: Record<string, number>;
  bodyPlanKey: string;
  paperSize: PaperSize;
}
