export { ZoneSheet } from './zone-sheet';
