import { render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import type { Role } from '@swapwright/shared';
import { activeNavKey, navItemsFor } from '../navigation';
import { AppNav } from '../routes/app/app-nav';

const expected: Record<Role, string[]> = {
  owner: ['Home', 'Projects', 'Customers', 'Work orders', 'Parts counter', 'Catalog', 'Members', 'Shop settings', 'Background work'],
  // the catalog is readable by estimators and fabricators (they pick parts and read specs)
  estimator: ['Home', 'Projects', 'Customers', 'Catalog'],
  fabricator: ['Home', 'Projects', 'Work orders', 'Catalog'],
  counter: ['Home', 'Parts counter', 'Catalog'],
  customer: ['My projects'],
};

function renderNav(role: Role, route = '/') {
  render(
    <MemoryRouter initialEntries={[route]}>
      <AppNav role={role} />
    </MemoryRouter>,
  );
  return within(screen.getByRole('navigation', { name: 'Main' }));
}

describe('role navigation', () => {
  it.each(Object.entries(expected) as [Role, string[]][])('%s sees exactly their own links', (role, names) => {
    const nav = renderNav(role);
    const links = nav.getAllByRole('link').map((a) => a.textContent);
    expect(links).toEqual(names);
  });

  it('only the owner gets Members, Shop settings and Background work', () => {
    for (const role of ['estimator', 'fabricator', 'counter', 'customer'] as Role[]) {
      const labels = navItemsFor(role).map((i) => i.label);
      expect(labels).not.toContain('Members');
      expect(labels).not.toContain('Shop settings');
      expect(labels).not.toContain('Background work');
    }
  });

  it('the fabricator’s Projects link opens on projects waiting to be measured', () => {
    const nav = renderNav('fabricator');
    expect(nav.getByRole('link', { name: 'Projects' }).getAttribute('href')).toBe('/projects?status=intake');
  });

  it('marks the current section, including detail pages below it', () => {
    const nav = renderNav('estimator', '/projects/p-1');
    expect(nav.getByRole('link', { name: 'Projects' }).getAttribute('aria-current')).toBe('page');
    expect(activeNavKey(navItemsFor('customer'), '/projects/p-1')).toBe('my-projects');
    expect(activeNavKey(navItemsFor('owner'), '/')).toBe('home');
  });
});
