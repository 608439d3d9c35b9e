/**
 * What the target power box takes. The project record holds 10 to 2,000 kW; in horsepower the box keeps to round
 * figures inside that (15 to 2,600 hp; 1 hp = 745.7 W, so 10 kW is 13.4 hp and 2,000 kW is 2,682 hp).
 * Source: NIST SP 811 (2008) B.8, horsepower (550 ft·lbf/s) = 745.6999 W.
 */
export const TARGET_POWER_BOUNDS = {
  kW: { min: 10, max: 2000, message: 'Between 10 and 2,000 kW, the range a project record holds' },
  hp: { min: 15, max: 2600, message: 'Between 15 and 2,600 hp (the project record holds 10 to 2,000 kW)' },
} as const;
