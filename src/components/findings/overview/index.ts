export { DiagramPanel } from './diagram-panel';
export { SurveyBar, sortSurveys, SURVEY_PURPOSE_SHORT } from './survey-bar';
export { VehicleFacts } from './vehicle-facts';
export { revealTop } from './reveal';
