export * from './types/finding';
export * from './types/fit-spec';
export * from './settings/fit-settings';
export * from './units/length';
