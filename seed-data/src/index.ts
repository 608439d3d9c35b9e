export const SEED_VERSION = 1;
