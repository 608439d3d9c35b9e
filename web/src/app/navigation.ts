import { paths } from '@/config/paths';
import type { Role } from '@swapwright/shared';

export type NavItem = {
  key: string;
  label: string;
  to: string;
  /** Paths that mark this item as the current one. */
  match: string[];
  group: 'work' | 'shop';
};

type NavDefinition = Omit<NavItem, 'to'> & { roles: readonly Role[]; to: string | ((role: Role) => string) };

const navDefinitions: readonly NavDefinition[] = [
  { key: 'home', label: 'Home', to: paths.home, match: [paths.home], roles: ['owner', 'estimator', 'fabricator', 'counter'], group: 'work' },
  { key: 'my-projects', label: 'My projects', to: paths.myProjects, match: [paths.myProjects, paths.projects], roles: ['customer'], group: 'work' },
  {
    key: 'projects',
    label: 'Projects',
    // the fabricator's list opens on what is waiting to be measured
    to: (role) => (role === 'fabricator' ? `${paths.projects}?status=intake` : paths.projects),
    match: [paths.projects],
    roles: ['owner', 'estimator', 'fabricator'],
    group: 'work',
  },
  { key: 'customers', label: 'Customers', to: paths.customers, match: [paths.customers], roles: ['owner', 'estimator'], group: 'work' },
  { key: 'work-orders', label: 'Work orders', to: paths.workOrders, match: [paths.workOrders], roles: ['owner', 'fabricator'], group: 'work' },
  { key: 'parts-counter', label: 'Parts counter', to: paths.partsCounter, match: [paths.partsCounter], roles: ['owner', 'counter'], group: 'work' },
  { key: 'catalog', label: 'Catalog', to: paths.catalog, match: [paths.catalog], roles: ['owner', 'estimator', 'fabricator', 'counter'], group: 'work' },
  { key: 'members', label: 'Members', to: paths.members, match: [paths.members], roles: ['owner'], group: 'shop' },
  { key: 'shop-settings', label: 'Shop settings', to: paths.shopSettings, match: [paths.shopSettings], roles: ['owner'], group: 'shop' },
  { key: 'background-work', label: 'Background work', to: paths.backgroundWork, match: [paths.backgroundWork], roles: ['owner'], group: 'shop' },
];

export function navItemsFor(role: Role): NavItem[] {
  return navDefinitions
    .filter((d) => d.roles.includes(role))
    .map(({ roles: _roles, to, ...rest }) => ({ ...rest, to: typeof to === 'function' ? to(role) : to }));
}

/** Which nav item the current path belongs to (longest match wins, "/" only exactly). */
export function activeNavKey(items: NavItem[], pathname: string): string | undefined {
  let best: { key: string; length: number } | undefined;
  for (const item of items) {
    for (const m of item.match) {
      const hit = m === '/' ? pathname === '/' : pathname === m || pathname.startsWith(`${m}/`);
      if (hit && (!best || m.length > best.length)) best = { key: item.key, length: m.length };
    }
  }
  return best?.key;
}

/** Roles allowed on each guarded section; the API enforces the same rules. */
export const sectionRoles = {
  projects: ['owner', 'estimator', 'fabricator', 'counter'],
  projectDetail: ['owner', 'estimator', 'fabricator', 'counter', 'customer'],
  // customers read their own project's stored reports (read-only)
  projectFit: ['owner', 'estimator', 'fabricator', 'counter', 'customer'],
  // customers see their own project's sheet and add photos; the API scopes them
  projectMeasurements: ['owner', 'estimator', 'fabricator', 'counter', 'customer'],
  myProjects: ['customer'],
  customers: ['owner', 'estimator', 'fabricator', 'counter'],
  // the estimator opens a quote from the project page to write its lines; the customer reads, answers and pays it
  quoteDetail: ['owner', 'estimator', 'customer'],
  workOrders: ['owner', 'fabricator'],
  // the estimator opens a project's work order from the project page
  workOrderDetail: ['owner', 'estimator', 'fabricator'],
  partsCounter: ['owner', 'counter'],
  catalog: ['owner', 'estimator', 'fabricator', 'counter'],
  members: ['owner'],
  shopSettings: ['owner'],
  backgroundWork: ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export const canEditCustomers = (role: Role): boolean => role === 'owner' || role === 'estimator';
/** Start a work order, record its checks and finish it, as the API allows. */
export const canWorkOrders = (role: Role): boolean => role === 'owner' || role === 'estimator' || role === 'fabricator';
/** Write quote lines, start revisions and send quotes (as the API allows). */
export const canWriteQuotes = (role: Role): boolean => role === 'owner' || role === 'estimator';
export const canEditProjects = (role: Role): boolean => role === 'owner' || role === 'estimator';
/** Customers only read stored fit reports: no catalog, selections or placement. */
export const isFitReadOnly = (role: Role): boolean => role === 'customer';
/** Run fit checks, change fit selections and save the placement. */
export const canRunFitCheck = (role: Role): boolean => role === 'owner' || role === 'estimator' || role === 'fabricator';
/** Enter readings, sign the sheet off, edit measurement templates, accept customers' photos (as the API allows). */
export const canMeasure = (role: Role): boolean => role === 'owner' || role === 'fabricator';
/** Add photos to a sheet: the measurers and the project's customer. */
export const canAddMeasurementPhotos = (role: Role): boolean => canMeasure(role) || role === 'customer';
/** Catalog writers, as the API allows: owner, estimator and counter (the fabricator reads). */
export const canEditCatalog = (role: Role): boolean => role === 'owner' || role === 'estimator' || role === 'counter';
