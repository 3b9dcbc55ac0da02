/**
 * Wood science for Soundframe: pure functions (no React, no Node APIs) shared by the server
 * and the app. Units are millimetres, °C and percent unless a name says inches. Sources:
 * /work/shared/SOURCES.md; rules of thumb are marked common practice where they are defined.
 */
export * from './types';
export * from './settings';
export { DomainError } from './errors';
export {
  equilibriumMoistureContent,
  correctMeterTemperature,
  correctMeterSpecies,
  correctedMoisture,
  decayRisk,
  moistureHint,
  isSpeciesKey,
  SPECIES_METER_CORRECTIONS,
  EMC_TEMP_RANGE_C,
  METER_TEMP_RANGE_C,
  FIBRE_SATURATION_PERCENT,
  DECAY_THRESHOLD_PERCENT,
  ELEVATED_THRESHOLD_PERCENT,
  WATER_SOURCE_MARGIN_POINTS,
  type MeterSpeciesCorrection,
  type CorrectedMoisture,
} from './moisture';
export { residualSection, rectangleProperties } from './section';
export {
  boardFeet,
  roughThicknessQuarters,
  surfacedThicknessIn,
  SURFACED_THICKNESS_IN,
  STANDARD_QUARTERS,
} from './lumber';
export { scarfLength, spliceGeometry, SPLICE_SPACING_FACTOR } from './splice';
export { likelyAgents, evidenceFromFinding, AGENT_LABELS } from './agents';
export {
  recommendVerdict,
  verdictRank,
  VERDICT_OPTION_LABELS,
  DECISION_CLASS_LABELS,
  percent,
} from './verdict';
export {
  estimateRepair,
  cutListLine,
  TRIM_ALLOWANCE_MM,
  type RepairEstimateInput,
} from './estimate';
export * from './units';
export { assessMember, type MemberContext, type MemberMeasurements } from './assess';
export { classForChosen, decisionFields, estimateForOption } from './decision';
