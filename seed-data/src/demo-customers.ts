import { DEMO_USER_IDS } from './demo-shop';

export interface DemoCustomer {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
  /** The login that sees this customer's projects. */
  userId: string | null;
}

export const DEMO_CUSTOMER_IDS = {
  juno: '5a0b1c2d-0000-4000-8000-000000000301',
  odile: '5a0b1c2d-0000-4000-8000-000000000302',
  caspar: '5a0b1c2d-0000-4000-8000-000000000303',
  tamsin: '5a0b1c2d-0000-4000-8000-000000000304',
  bram: '5a0b1c2d-0000-4000-8000-000000000305',
} as const;

/** Juno has the demo customer login; the others are walk-in and phone customers. */
export const DEMO_CUSTOMERS: DemoCustomer[] = [
  {
    id: DEMO_CUSTOMER_IDS.juno,
    name: 'Juno Brackenridge',
    email: 'customer@ironbark.test',
    phone: '+1 555 0141',
    notes: 'Owner-builder; wants to do the wiring herself. Prefers e-mail.',
    userId: DEMO_USER_IDS.customer,
  },
  {
    id: DEMO_CUSTOMER_IDS.odile,
    name: 'Odile Straker',
    email: 'odile.straker@example.test',
    phone: '+1 555 0142',
    notes: 'Tows a horse trailer most weekends.',
    userId: null,
  },
  {
    id: DEMO_CUSTOMER_IDS.caspar,
    name: 'Caspar Wendeline',
    email: 'caspar.w@example.test',
    phone: null,
    notes: null,
    userId: null,
  },
  {
    id: DEMO_CUSTOMER_IDS.tamsin,
    name: 'Tamsin Greave',
    email: null,
    phone: '+1 555 0144',
    notes: 'Call after 4 pm.',
    userId: null,
  },
  {
    id: DEMO_CUSTOMER_IDS.bram,
    name: 'Bram Holloway-Finch',
    email: 'bram.hf@example.test',
    phone: '+1 555 0145',
    notes: 'Trail rig; asks for a quote in spring.',
    userId: null,
  },
];
