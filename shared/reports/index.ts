/**
 * The report model (pure; no React, no Node APIs): snapshot → repair scope → buyer's
 * condition report and the summary the share and verification pages show.
 */
export * from './types';
export { buildRepairScope, zoneSeverities } from './scope';
export { notInspectedItems, reportCover } from './records';
export { buildConditionReport, conditionReportFromScope, headline } from './buyer';
export { reportSummary } from './summary';
export { repairPlanFromScope } from './plan';
export {
  conditionSummary,
  conditionMetrics,
  gradeFor,
  isPrimarySound,
  CONDITION_RULES,
  CONDITION_GRADE_TEXT,
  type ConditionInput,
  type ConditionMetrics,
} from './condition';
export {
  orderOfWork,
  WORK_STEP_RULES,
  WORK_PRECEDENCE,
  type WorkItem,
  type WorkStepKey,
} from './work-order';
export { findingWords, reportCautions, SURVEY_LIMITATIONS } from './text';
