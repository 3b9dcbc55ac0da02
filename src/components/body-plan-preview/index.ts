export { BodyPlanPreview } from './body-plan-preview';
