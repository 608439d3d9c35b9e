import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { apiClient } from '@/lib/api-client';
import { pageOf, userStub } from '@/test/fixtures';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { CatalogPage } from '../catalog-page';

function renderAs(role: 'fabricator' | 'estimator') {
  vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([]) });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(authKeys.me(), userStub(role));
  return renderWithApp(<CatalogPage />, { queryClient, route: '/catalog' });
}

describe('CatalogPage', () => {
  it('tells a role that cannot edit, calmly and in plain words, who keeps the catalog', async () => {
    setWindowWidth(1440);
    renderAs('fabricator');
    const notice = await screen.findByText('You can look up every entry');
    const alert = notice.closest('.ant-alert');
    expect(alert).toHaveClass('ant-alert-info');
    expect(alert).not.toHaveClass('ant-alert-warning');
    expect(alert).not.toHaveClass('ant-alert-error');
    expect(alert).toHaveTextContent('The owner, the estimators and the parts counter keep the catalog. Ask one of them to add an entry or change a figure.');
  });

  it('shows no notice to a role that keeps the catalog', async () => {
    setWindowWidth(1440);
    renderAs('estimator');
    await screen.findByRole('tab', { name: 'Engines' });
    expect(screen.queryByText('You can look up every entry')).not.toBeInTheDocument();
  });

  it('at 1440 px stands every kind in a column beside the table; on a phone they run along the top with the overflow menu', async () => {
    setWindowWidth(1440);
    const wide = renderAs('estimator');
    const tabs = within(wide.container).getAllByRole('tab').map((tab) => tab.textContent);
    expect(tabs).toEqual(expect.arrayContaining(['Engines', 'Chassis', 'Bellhousing adapters', 'Accessory drive belts']));
    expect(wide.container.querySelector('.ant-tabs')).toHaveClass('ant-tabs-left');
    wide.unmount();

    setWindowWidth(390);
    const phone = renderAs('estimator');
    await within(phone.container).findByRole('tab', { name: 'Engines' });
    expect(phone.container.querySelector('.ant-tabs')).toHaveClass('ant-tabs-top');
  });
});
