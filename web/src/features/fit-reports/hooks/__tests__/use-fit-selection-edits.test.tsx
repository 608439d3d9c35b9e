import { QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient } from '@/test/render';
import type { FitSelections } from '../../types';
import { useFitSelectionEdits } from '../use-fit-selection-edits';

const stored: FitSelections = {
  projectId: 'p1',
  oilPanId: 'pan-stock',
  oilPickupId: 'pickup-front',
  oilPumpId: 'pump-1',
  controllerId: null,
  accessoryDriveId: 'drive-truck',
  mountAdapterId: null,
  driveshaft: null,
  timingSetAdvanceDeg: null,
  topSpeedKph: 160,
  tireDiameterMm: 760,
  axleRatio: 3.73,
  continuousPowerKw: null,
  updatedAt: '2026-11-02T10:00:00.000Z',
};

function renderEdits() {
  const queryClient = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  return renderHook(
    () =>
      useFitSelectionEdits({
        projectId: 'p1',
        selections: stored,
        spec: undefined,
        catalogPans: [],
        catalogPickups: [],
        partName: () => undefined,
      }),
    { wrapper },
  );
}

describe('useFitSelectionEdits', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends only the changed field with PATCH, not the whole selection', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: { ...stored, oilPumpId: 'pump-2' } });
    const put = vi.spyOn(apiClient, 'put');
    const { result } = renderEdits();

    await act(() => result.current.save({ oilPumpId: 'pump-2' }));

    expect(patch).toHaveBeenCalledTimes(1);
    expect(patch).toHaveBeenCalledWith('/projects/p1/fit-selections', { oilPumpId: 'pump-2' });
    expect(put).not.toHaveBeenCalled();
  });

  it('sends a cleared field as null and nothing else', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: { ...stored, tireDiameterMm: null } });
    const { result } = renderEdits();

    await act(() => result.current.save({ tireDiameterMm: null }));

    expect(patch).toHaveBeenCalledWith('/projects/p1/fit-selections', { tireDiameterMm: null });
  });
});
