export { BodyDiagram, type BodyDiagramProps } from './body-diagram';
export { DiagramLegend } from './diagram-legend';
export { ViewSwitcher, VIEW_LABELS } from './view-switcher';
export {
  summarizeZones,
  pinsForView,
  zoneAccessibilityLabel,
  type ZoneSummary,
  type DiagramPin,
} from './zone-summary';
export type { ViewPoint } from './view-point';
export {
  FLAGGED_LABEL,
  ZONE_STATE_LABELS,
  zoneStateLabel,
  type ZoneStateCue,
  type ZoneStateKey,
} from './zone-state';
