/**
 * Treatments and re-check monitoring (pure; no React, no Node APIs). Calendar dates are
 * 'YYYY-MM-DD' strings in the workshop's time zone; all calendar arithmetic is date-fns.
 * Sources: /work/shared/SOURCES.md "Treatment and law"; rules of thumb are marked common practice.
 */
export * from './settings';
export { localDate, addCalendarDays, calendarDaysBetween, spokenDate } from './dates';
export { planGroupFor, recheckDueDates } from './plan';
export { TREATMENT_CAUTIONS, cautionsFor, type TreatmentCaution } from './cautions';
export {
  zoneStates,
  zoneStateItems,
  TREATMENT_FAILURE_ADVICE,
  type ZoneFindingInput,
  type ZoneTreatmentInput,
  type ZoneRecheckInput,
  type ZoneStatesInput,
  type ZoneStateResult,
} from './zone-state';
