import { useQuery } from '@tanstack/react-query';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { AxiosError, AxiosHeaders } from 'axios';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { workOrderKeys } from '../../api/work-order-keys';
import type { WorkCheck, WorkOrder } from '../../types';
import { CheckPhotos } from '../check-photos';

const ORDER_ID = 'wo-1';

const photo = (id: string, uploadedByName: string): WorkCheck['photos'][number] => ({
  id,
  contentType: 'image/jpeg',
  widthPx: 4032,
  heightPx: 3024,
  bytes: 3_200_000,
  uploadedByName,
  createdAt: '2026-12-03T09:15:00.000Z',
});

const check: WorkCheck = {
  key: 'oil-pan-pickup.pickup-tabs',
  label: 'Pickup bolted at both tabs',
  measured: false,
  unit: null,
  min: null,
  max: null,
  range: null,
  rangeFrom: null,
  fitFinding: null,
  latest: null,
  recordings: 0,
  photos: [photo('photo-right', 'Dara Quill'), photo('photo-wrong', 'Dara Quill')],
};

/** Just what the check's photos read from the work order in the cache. */
const orderWith = (photos: WorkCheck['photos']) => ({ id: ORDER_ID, steps: [{ key: 'oil-pan-pickup', checks: [{ ...check, photos }] }] }) as unknown as WorkOrder;

function Harness({ canAdd }: { canAdd: boolean }) {
  const order = useQuery({ queryKey: workOrderKeys.detail(ORDER_ID), queryFn: async () => (await apiClient.get<WorkOrder>(`/work-orders/${ORDER_ID}`)).data });
  const shown = order.data?.steps[0].checks[0];
  return shown ? <CheckPhotos workOrderId={ORDER_ID} check={shown} canAdd={canAdd} /> : null;
}

function render(canAdd: boolean) {
  const view = renderWithApp(<Harness canAdd={canAdd} />);
  view.queryClient.setQueryData(workOrderKeys.detail(ORDER_ID), orderWith(check.photos));
  return view;
}

describe('a wrong check photo is removed after a confirmation', () => {
  let removed: string[];

  beforeEach(() => {
    removed = [];
    URL.createObjectURL = vi.fn(() => 'blob:thumb');
    URL.revokeObjectURL = vi.fn();
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) =>
      url.endsWith('/file') ? { data: new Blob(['jpeg'], { type: 'image/jpeg' }) } : { data: orderWith(check.photos.filter((p) => !removed.includes(p.id))) },
    );
    vi.spyOn(apiClient, 'delete').mockImplementation(async (url: string) => {
      removed.push(url.split('/').pop()!);
      return { data: undefined, status: 204 };
    });
  });

  afterEach(() => vi.restoreAllMocks());

  it('asks first; "Remove" deletes that photo only and takes it off the check', async () => {
    render(true);
    const tiles = await screen.findAllByTestId('check-photo');
    expect(tiles).toHaveLength(2);
    fireEvent.click(within(tiles[1]).getByRole('button', { name: /^Remove photo \(Dara Quill, / }));
    const confirm = await screen.findByRole('tooltip');
    expect(confirm).toHaveTextContent('Remove this photo?');
    expect(confirm).toHaveTextContent('It is taken off the check and deleted.');
    expect(apiClient.delete).not.toHaveBeenCalled();
    fireEvent.click(within(confirm).getByRole('button', { name: 'Remove' }));
    await waitFor(() => expect(screen.getAllByTestId('check-photo')).toHaveLength(1));
    expect(apiClient.delete).toHaveBeenCalledTimes(1);
    expect(apiClient.delete).toHaveBeenCalledWith('/work-order-photos/photo-wrong');
  });

  it('"Keep" closes the question and removes nothing', async () => {
    render(true);
    const [first] = await screen.findAllByTestId('check-photo');
    fireEvent.click(within(first).getByRole('button', { name: /^Remove photo/ }));
    fireEvent.click(within(await screen.findByRole('tooltip')).getByRole('button', { name: 'Keep' }));
    await waitFor(() => expect(screen.queryByText('Remove this photo?')).not.toBeVisible());
    expect(apiClient.delete).not.toHaveBeenCalled();
    expect(screen.getAllByTestId('check-photo')).toHaveLength(2);
  });

  it('a finished job (or a role that records no checks) shows its photos without a remove command', async () => {
    render(false);
    expect(await screen.findAllByTestId('check-photo')).toHaveLength(2);
    expect(screen.queryByRole('button', { name: /^Remove photo/ })).toBeNull();
  });

  it('a HEIC photo the API refuses says what to send instead, with no retry of the same file', async () => {
    const message =
      '"IMG_0412.HEIC" is a HEIC/HEIF photo, which is not accepted yet. Send it as a JPEG: set the camera to save photos as JPEG, or share or export the photo as JPEG, then add it again.';
    vi.spyOn(apiClient, 'post').mockRejectedValue(
      new AxiosError('Request failed with status code 415', 'ERR_BAD_REQUEST', undefined, undefined, {
        status: 415,
        statusText: 'Unsupported Media Type',
        headers: {},
        config: { headers: new AxiosHeaders() },
        data: { statusCode: 415, code: 'photo_heif_not_accepted', message, details: [] },
      }),
    );
    render(true);
    await screen.findAllByTestId('check-photo');
    const heic = new File([new Uint8Array(64)], 'IMG_0412.HEIC', { type: 'image/heic' });
    fireEvent.change(screen.getByLabelText(`Take or add photos: ${check.label}`), { target: { files: [heic] } });
    const refused = await screen.findByTestId('check-photo-upload');
    expect(await within(refused).findByRole('alert')).toHaveTextContent(message);
    expect(within(refused).queryByRole('button', { name: 'Retry' })).toBeNull();
    fireEvent.click(within(refused).getByRole('button', { name: 'Discard' }));
    await waitFor(() => expect(screen.queryByTestId('check-photo-upload')).toBeNull());
  });
});
