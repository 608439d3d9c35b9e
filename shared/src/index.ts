export * from './types/finding';
export * from './types/fit-spec';
export * from './settings/fit-settings';
export * from './units/length';
export * from './geometry/placement';
export * from './checks/check-definition';
export * from './checks/system-checks';
