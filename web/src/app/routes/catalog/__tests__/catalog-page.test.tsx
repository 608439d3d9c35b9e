import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { apiClient } from '@/lib/api-client';
import { pageOf, userStub } from '@/test/fixtures';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { CatalogPage } from '../catalog-page';

function renderAs(role: 'fabricator' | 'estimator' | 'owner') {
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

  it("offers the owner of an empty catalog the sample catalog in one press, and says what it added", async () => {
    setWindowWidth(390);
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({
      data: { added: 33, alreadyThere: 0, kinds: [], message: 'Added 33 sample records to your catalog: 3 engines, 3 chassis.' },
    });
    renderAs('owner');
    const offer = await screen.findByTestId('sample-catalog-offer');
    expect(offer).toHaveTextContent('No engines in your catalog yet');
    await userEvent.click(within(offer).getByRole('button', { name: 'Start from the sample catalog' }));
    expect(post).toHaveBeenCalledWith('/catalog/sample');
    expect(await within(offer).findByText('Added 33 sample records to your catalog: 3 engines, 3 chassis.')).toBeInTheDocument();
  });

  it('tells a role that cannot start it whom to ask, without the button', async () => {
    setWindowWidth(390);
    renderAs('estimator');
    const offer = await screen.findByTestId('sample-catalog-offer');
    expect(offer).toHaveTextContent('Ask the shop owner to start it from Swapwright’s sample catalog');
    expect(within(offer).queryByRole('button', { name: 'Start from the sample catalog' })).toBeNull();
  });
});
