import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { AxiosProgressEvent, AxiosRequestConfig } from 'axios';
import { AxiosError, AxiosHeaders } from 'axios';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { usePhotoUploads } from '../../hooks/use-photo-uploads';
import type { MeasurementPhoto } from '../../types';
import { PhotoStrip, type PhotoActions } from '../photo-strip';

const LABEL = 'Front crossmember: top';

function Harness() {
  const uploads = usePhotoUploads('project-1');
  const actions: PhotoActions = {
    canAdd: true,
    canDelete: () => false,
    canReview: false,
    pendingLabel: 'From the customer',
    onAdd: uploads.add,
    onRetry: uploads.retry,
    onDismiss: uploads.dismiss,
    onDelete: async () => undefined,
    onAccept: () => undefined,
  };
  return <PhotoStrip label={LABEL} pointId="front-crossmember.top" photos={[]} uploads={uploads.uploads} uploadedIds={uploads.uploadedIds} actions={actions} />;
}

const stored: MeasurementPhoto = {
  id: 'photo-1',
  pointId: 'front-crossmember.top',
  contentType: 'image/jpeg',
  bytes: 4_000_000,
  widthPx: 4032,
  heightPx: 3024,
  status: 'accepted',
  uploadedBy: 'A. Fabricator',
  uploadedById: 'user-1',
  createdAt: '2026-12-03T04:00:00.000Z',
  url: '/api/measurement-photos/photo-1/file',
};

/** A request the test answers by hand, after feeding it progress events as a browser would. */
type Pending = { config: AxiosRequestConfig; resolve: (photos: MeasurementPhoto[]) => void; reject: (error: unknown) => void };

function holdUploads(): Pending[] {
  const pending: Pending[] = [];
  vi.spyOn(apiClient, 'post').mockImplementation(
    (_url: string, _body?: unknown, config?: AxiosRequestConfig) =>
      new Promise((resolve, reject) => {
        pending.push({ config: config ?? {}, resolve: (photos) => resolve({ data: photos }), reject });
      }) as never,
  );
  return pending;
}

const progress = (request: Pending, loaded: number, total: number) =>
  act(() => request.config.onUploadProgress?.({ loaded, total, bytes: 0, lengthComputable: true } as AxiosProgressEvent));

const bar = () => screen.getByRole('progressbar');
const photo = () => new File([new Uint8Array(4_000_000)], 'crossmember.jpg', { type: 'image/jpeg' });

function pick(file: File) {
  fireEvent.change(screen.getByLabelText(`Take or add photos: ${LABEL}`), { target: { files: [file] } });
}

describe('a photo on its way up shows how far it is', () => {
  beforeEach(() => {
    URL.createObjectURL = vi.fn(() => 'blob:local-preview');
    URL.revokeObjectURL = vi.fn();
  });

  it('follows the bytes sent, holds short of 100 until the server has stored it, then shows the thumbnail', async () => {
    const pending = holdUploads();
    renderWithApp(<Harness />);
    pick(photo());
    await waitFor(() => expect(pending).toHaveLength(1));
    expect(bar()).toHaveAttribute('aria-valuenow', '0');

    // A 4 MB photo going up over shop Wi-Fi, as the browser reports it.
    for (const [loaded, shown] of [
      [400_000, '10'],
      [1_000_000, '25'],
      [2_600_000, '65'],
      [3_960_000, '99'],
      // every byte sent, the server still checking and storing it: not 100 yet
      [4_000_000, '99'],
    ] as const) {
      progress(pending[0], loaded, 4_000_000);
      expect(bar()).toHaveAttribute('aria-valuenow', shown);
      expect(screen.queryByText('Uploaded')).not.toBeInTheDocument();
    }
    await act(async () => pending[0].resolve([stored]));
    const tile = await screen.findByTestId('photo-thumb');
    expect(within(tile).getByText('Uploaded')).toBeInTheDocument();
    expect(within(tile).getByRole('progressbar')).toHaveAttribute('aria-valuenow', '100');
    expect(within(tile).getByRole('img', { name: `Photo: ${LABEL}` })).toHaveAttribute('src', 'blob:local-preview');
  });

  it('a failed upload says why and can be retried from the start', async () => {
    const pending = holdUploads();
    renderWithApp(<Harness />);
    pick(photo());
    await waitFor(() => expect(pending).toHaveLength(1));
    progress(pending[0], 2_000_000, 4_000_000);
    expect(bar()).toHaveAttribute('aria-valuenow', '50');
    const body = { statusCode: 413, code: 'photo_too_large', message: 'A photo is over 15 MB: send it at the camera’s normal size.', details: [] };
    await act(async () =>
      pending[0].reject(
        new AxiosError('Payload Too Large', 'ERR_BAD_REQUEST', undefined, undefined, { status: 413, data: body, statusText: '', headers: {}, config: { headers: new AxiosHeaders() } }),
      ),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent('A photo is over 15 MB');

    fireEvent.click(screen.getByRole('button', { name: 'Retry' }));
    await waitFor(() => expect(pending).toHaveLength(2));
    expect(bar()).toHaveAttribute('aria-valuenow', '0');
    progress(pending[1], 1_000_000, 4_000_000);
    expect(bar()).toHaveAttribute('aria-valuenow', '25');
    await act(async () => pending[1].resolve([stored]));
    expect(await screen.findByText('Uploaded')).toBeInTheDocument();
  });
});
