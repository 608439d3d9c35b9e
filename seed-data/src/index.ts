export const SEED_VERSION = 1;
export * from './demo-shop';
export * from './demo-customers';
export * from './demo-projects';
export * from './catalog';
export * from './demo-labor-operations';
export * from './demo-measurements';
export * from './demo-story';
