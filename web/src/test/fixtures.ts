import { runFitCheck, type Role } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import type { CurrentUser, Schemas, Session } from '@/lib/api-types';
import type { Customer } from '@/features/customers/types';
import type { StoredFitReport } from '@/features/fit-reports/types';

export const shopStub = { id: 'shop-ironbark', name: 'Ironbark Swap Works', unitSystem: 'in' as const };

export function userStub(role: Role = 'owner'): CurrentUser {
  return {
    id: `user-${role}`,
    email: `${role}@ironbark.example`,
    name: 'Merrin Tolland',
    role,
    shop: shopStub,
    customerId: role === 'customer' ? 'cust-1' : null,
  };
}

export const sessionStub: Session = {
  accessToken: 'access-token-1',
  refreshToken: 'refresh-token-1',
  expiresIn: 900,
  user: userStub('owner'),
};

export const customerStubs: Customer[] = [
  {
    id: 'cust-1',
    name: 'Marlo Penhallow',
    email: 'marlo@example.com',
    phone: '555-0142',
    notes: null,
    userId: null,
    ownRecord: false,
    createdAt: '2026-10-02T09:00:00.000Z',
    updatedAt: '2026-11-20T15:30:00.000Z',
  },
  {
    id: 'cust-2',
    name: 'Tove Quillfeather',
    email: null,
    phone: '555-0199',
    notes: 'Prefers text messages',
    userId: 'user-77',
    ownRecord: false,
    createdAt: '2026-09-14T12:00:00.000Z',
    updatedAt: '2026-11-01T08:10:00.000Z',
  },
];

export function pageOf<T>(items: T[], page = 1, pageSize = 20, total = items.length): { items: T[] } & Schemas['PageMetaResponseDto'] {
  return { items, total, page, pageSize };
}

/** A stored fit report of the shared demo spec at its own placement, as the API answers it (id r1 of project p1). */
export function storedFitReportStub(overrides: Partial<StoredFitReport> = {}): StoredFitReport {
  const report = runFitCheck(DEMO_FIT_SPEC);
  return {
    id: 'r1',
    projectId: 'p1',
    createdAt: '2026-11-02T10:00:00.000Z',
    createdById: 'u1',
    createdByName: 'Sam Reyes',
    engineVersion: report.engineVersion,
    placement: DEMO_FIT_SPEC.placement,
    placementSource: 'project',
    counts: report.summary,
    worstStatus: 'fails',
    caution: report.caution,
    report,
    inputs: { spec: DEMO_FIT_SPEC, settingsOverrides: {}, placementSource: 'project', notes: [] },
    ...overrides,
  };
}
