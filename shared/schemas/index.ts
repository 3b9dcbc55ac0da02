export * from './common';
export * from './auth';
export * from './workshop';
export * from './vehicle';
export * from './survey';
export * from './finding';
export * from './decision';
