/** The invented demo shop. Every id is fixed so links, tests and journeys can name records directly. */
export type DemoRole = 'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer';

export const DEMO_SHOP_ID = '5a0b1c2d-0000-4000-8000-000000000001';
export const DEMO_PASSWORD = 'swap-demo-2026';

export interface DemoShop {
  id: string;
  name: string;
  unitSystem: 'in' | 'mm';
  laborRatePerHour: number;
  taxRatePercent: number;
  shopSuppliesPercent: number;
  currency: string;
  /** IANA time zone name: the shop's calendar day for quotes. */
  timeZone: string;
}

export const DEMO_SHOP: DemoShop = {
  id: DEMO_SHOP_ID,
  name: 'Ironbark Swap Works',
  unitSystem: 'in',
  laborRatePerHour: 135,
  taxRatePercent: 8.25,
  shopSuppliesPercent: 4,
  currency: 'USD',
  timeZone: 'America/Denver',
};

export interface DemoUser {
  id: string;
  membershipId: string;
  role: DemoRole;
  email: string;
  name: string;
}

export const DEMO_USER_IDS = {
  owner: '5a0b1c2d-0000-4000-8000-000000000101',
  estimator: '5a0b1c2d-0000-4000-8000-000000000102',
  fabricator: '5a0b1c2d-0000-4000-8000-000000000103',
  counter: '5a0b1c2d-0000-4000-8000-000000000104',
  customer: '5a0b1c2d-0000-4000-8000-000000000105',
} as const satisfies Record<DemoRole, string>;

export const DEMO_MEMBERSHIP_IDS = {
  owner: '5a0b1c2d-0000-4000-8000-000000000201',
  estimator: '5a0b1c2d-0000-4000-8000-000000000202',
  fabricator: '5a0b1c2d-0000-4000-8000-000000000203',
  counter: '5a0b1c2d-0000-4000-8000-000000000204',
  customer: '5a0b1c2d-0000-4000-8000-000000000205',
} as const satisfies Record<DemoRole, string>;

export const DEMO_USERS: DemoUser[] = [
  { role: 'owner', email: 'owner@ironbark.test', name: 'Marla Quennell' },
  { role: 'estimator', email: 'estimator@ironbark.test', name: 'Tobin Arkwright' },
  { role: 'fabricator', email: 'fabricator@ironbark.test', name: 'Sefa Lindqvist-Moro' },
  { role: 'counter', email: 'counter@ironbark.test', name: 'Imre Castellane' },
  { role: 'customer', email: 'customer@ironbark.test', name: 'Juno Brackenridge' },
].map((user) => ({
  ...user,
  role: user.role as DemoRole,
  id: DEMO_USER_IDS[user.role as DemoRole],
  membershipId: DEMO_MEMBERSHIP_IDS[user.role as DemoRole],
}));

export interface DemoSignIn {
  role: DemoRole;
  email: string;
  password: string;
  name: string;
}

export const DEMO_SIGN_INS: DemoSignIn[] = DEMO_USERS.map(({ role, email, name }) => ({
  role,
  email,
  password: DEMO_PASSWORD,
  name,
}));
