import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { CatalogItemOf } from '../../types';
import { CatalogItemDrawer } from '../catalog-item-drawer';

const stockBelt: CatalogItemOf<'belts'> = {
  id: 'belt-1',
  name: 'Ironbark stock 6PK1225',
  createdAt: '2026-11-02T09:00:00.000Z',
  updatedAt: '2026-11-02T09:00:00.000Z',
  spec: { id: 'belt-1', name: 'Ironbark stock 6PK1225', ribs: 6, profile: 'PK', effectiveLengthMm: 1225, designation: '6PK1225', stockOnHand: 4 },
};

afterEach(() => vi.restoreAllMocks());

describe('belt form', () => {
  it('sends ribs and the length typed in inches as millimetres, and previews the designation', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: stockBelt });
    const onClose = vi.fn();
    renderWithApp(<CatalogItemDrawer kind="belts" open onClose={onClose} />);

    await userEvent.type(screen.getByLabelText('Name'), 'Shelf belt');
    const ribs = screen.getByRole('spinbutton', { name: 'Ribs' }) as HTMLInputElement;
    expect(ribs.value).toBe('6');
    // 48.23 in × 25.4 = 1225.042 mm (1 in = 25.4 mm exactly, NIST SP 811 appendix B).
    await userEvent.type(screen.getByRole('textbox', { name: 'Effective length' }), '48.23');
    // Source: ISO 9982:2019 (PK rib pitch 3.56 mm; designation ribs × profile × effective length)
    expect(screen.getByTestId('belt-designation').textContent).toBe('Designation: 6PK1225');

    await userEvent.click(screen.getByRole('button', { name: 'Add accessory drive belt' }));
    await waitFor(() => expect(post).toHaveBeenCalledTimes(1));
    const [url, body] = post.mock.calls[0];
    expect(url).toBe('/catalog/belts');
    expect(body).toMatchObject({ name: 'Shelf belt', ribs: 6 });
    expect((body as { effectiveLengthMm: number }).effectiveLengthMm).toBeCloseTo(1225.042, 6);
    expect(body).not.toHaveProperty('designation');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
  });

  it('keeps ribs inside 3–12: a wider count is held at 12 before sending', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: stockBelt });
    renderWithApp(<CatalogItemDrawer kind="belts" open onClose={() => undefined} />);
    await userEvent.type(screen.getByLabelText('Name'), 'Too wide');
    const ribs = screen.getByRole('spinbutton', { name: 'Ribs' }) as HTMLInputElement;
    await userEvent.clear(ribs);
    await userEvent.type(ribs, '14');
    await userEvent.type(screen.getByRole('textbox', { name: 'Effective length' }), '48');
    expect(ribs.value).toBe('12');
    await userEvent.click(screen.getByRole('button', { name: 'Add accessory drive belt' }));
    await waitFor(() => expect(post).toHaveBeenCalledTimes(1));
    expect(post.mock.calls[0][1]).toMatchObject({ ribs: 12 });
  });

  it('edits a stored belt without sending its designation or profile', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: stockBelt });
    renderWithApp(<CatalogItemDrawer kind="belts" open item={stockBelt} onClose={() => undefined} />);
    const shelf = screen.getByRole('spinbutton', { name: 'On the shelf' });
    await waitFor(() => expect((shelf as HTMLInputElement).value).toBe('4'));
    await userEvent.clear(shelf);
    await userEvent.type(shelf, '3');
    await userEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    const [url, body] = patch.mock.calls[0];
    expect(url).toBe('/catalog/belts/belt-1');
    expect(body).toEqual({ name: 'Ironbark stock 6PK1225', ribs: 6, effectiveLengthMm: 1225, stockOnHand: 3 });
  });
});
