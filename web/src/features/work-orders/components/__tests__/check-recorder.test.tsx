import { fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { WorkCheck } from '../../types';
import { CheckRecorder } from '../check-recorder';

// Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly. 12.7 mm = 0.50 in; 7.5 mm = 0.295 in → 0.30 in;
// 1/2 in = 12.7 mm; 14 mm = 0.551 in → 0.55 in.

const gap: WorkCheck = {
  key: 'engine-remove-install.mount-gap',
  label: 'Oil pan to crossmember gap with the engine on its mounts',
  measured: true,
  unit: 'mm',
  min: 12.7,
  max: null,
  range: 'at least 12.7 mm',
  rangeFrom: null,
  fitFinding: {
    checkId: 'envelope.sump-crossmember',
    title: 'Oil pan to crossmember',
    status: 'ok',
    message: 'The oil pan clears the front crossmember by 49.4 mm (1.94 in); at least 12.7 mm (0.50 in) is required: 36.7 mm (1.44 in) to spare.',
  },
  latest: { id: 'rec-1', result: 'fail', value: 7.5, note: '', recordedByName: 'Dara Quill', recordedAt: '2026-12-03T09:15:00.000Z' },
  recordings: 1,
  photos: [],
};

describe('a length check in the person’s units', () => {
  let posted: unknown[];
  beforeEach(() => {
    posted = [];
    vi.spyOn(apiClient, 'post').mockImplementation(async (_url: string, body: unknown) => {
      posted.push(body);
      return { data: { id: 'wo-1', steps: [] } };
    });
  });
  afterEach(() => {
    vi.restoreAllMocks();
    window.localStorage.removeItem('swapwright.unitSystem');
  });

  it('in an inch shop shows the allowed value, the recording and the fit check in inches, and takes 1/2"', async () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={gap} canRecord />);
    expect(screen.getByText('Allowed at least 0.50 in')).toBeInTheDocument();
    expect(screen.getByTestId('check-result')).toHaveTextContent('Failed · 0.30 in');
    expect(screen.getByTestId('check-fit-finding')).toHaveTextContent('by 1.94 in; at least 0.50 in is required: 1.44 in to spare.');
    expect(document.body.textContent).not.toMatch(/\d mm\b/);

    const box = screen.getByRole('textbox', { name: /^Value for / });
    fireEvent.change(box, { target: { value: 'abc' } });
    expect(screen.getByRole('alert')).toHaveTextContent('"abc" is not a length');
    expect(screen.getByRole('button', { name: 'Record value' })).toBeDisabled();
    fireEvent.change(box, { target: { value: '1/2"' } });
    expect(screen.getByTestId('check-reading')).toHaveTextContent('Reads as 0.50 in (12.7 mm)');
    fireEvent.click(screen.getByRole('button', { name: 'Record value' }));
    await vi.waitFor(() => expect(posted).toEqual([{ checkKey: gap.key, value: 12.7 }]));
  });

  it('reads a figure typed in millimetres in an inch shop, and a bare number in the person’s unit', async () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={gap} canRecord />);
    const box = screen.getByRole('textbox', { name: /^Value for / });
    fireEvent.change(box, { target: { value: '14 mm' } });
    expect(screen.getByTestId('check-reading')).toHaveTextContent('Reads as 0.55 in (14 mm)');
    fireEvent.change(box, { target: { value: '0.5' } });
    expect(screen.getByTestId('check-reading')).toHaveTextContent('Reads as 0.50 in (12.7 mm)');
  });

  it('in a millimetre shop keeps the allowed value’s own precision: 12.7 mm, never 13 mm', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={gap} canRecord />);
    expect(screen.getByText('Allowed at least 12.7 mm')).toBeInTheDocument();
    expect(screen.getByTestId('check-result')).toHaveTextContent('Failed · 7.5 mm');
    expect(screen.getByTestId('check-fit-finding')).toHaveTextContent('by 49.4 mm; at least 12.7 mm is required');
  });
});
