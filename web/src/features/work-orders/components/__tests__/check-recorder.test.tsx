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
    resolvedBy: null,
  },
  latest: { id: 'rec-1', result: 'fail', value: 7.5, note: '', recordedByName: 'Dara Quill', recordedAt: '2026-12-03T09:15:00.000Z' },
  recordings: 1,
  photos: [],
};

/** Every body the recorder posts, answered with an empty work order. */
function recordPosts(): unknown[] {
  const posted: unknown[] = [];
  vi.spyOn(apiClient, 'post').mockImplementation(async (_url: string, body: unknown) => {
    posted.push(body);
    return { data: { id: 'wo-1', steps: [] } };
  });
  return posted;
}

describe('a length check in the person’s units', () => {
  let posted: unknown[];
  beforeEach(() => {
    posted = recordPosts();
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

/** A confirmation: no unit, no range. */
const welds: WorkCheck = { ...gap, key: 'crossmember.welds', label: 'Crossmember welds inspected', measured: false, unit: null, min: null, range: null, fitFinding: null, latest: null, recordings: 0 };

describe('a fit finding the plan resolves', () => {
  it('says what in the plan resolves it and to measure after fitting, not the bare verdict of the truck as it came', () => {
    // Common practice (no published source): a clearance fixed by a part is measured again with the part fitted.
    const resolved: WorkCheck = {
      ...gap,
      latest: null,
      recordings: 0,
      fitFinding: {
        checkId: 'envelope.sump-crossmember',
        title: 'Oil pan to crossmember',
        status: 'fails',
        message: 'The oil pan runs 74.4 mm (2.93 in) into the front crossmember.',
        resolvedBy: 'the part TR-4410 Rear-sump swap pan',
      },
    };
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={resolved} canRecord />);
    const words = screen.getByTestId('check-fit-finding');
    expect(words).toHaveTextContent('Fit check, Oil pan to crossmember: resolved in the plan by the part TR-4410 Rear-sump swap pan: measure after fitting.');
    expect(words).not.toHaveTextContent('does not fit');
  });
});

describe('a confirmation that is not right', () => {
  let posted: unknown[];
  beforeEach(() => {
    posted = recordPosts();
  });
  afterEach(() => vi.restoreAllMocks());

  it('asks what is wrong before it records a failure, and sends the note with it', async () => {
    // Common practice (no published source): a failed weld inspection is written up with what was found and where.
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={welds} canRecord />);
    fireEvent.click(screen.getByRole('button', { name: 'Not right' }));
    expect(screen.getByTestId('check-note-wanted')).toHaveTextContent('Say in the note what is not right');
    expect(posted).toEqual([]);
    fireEvent.change(screen.getByRole('textbox', { name: /^Note for / }), { target: { value: 'Undercut on the left gusset weld' } });
    expect(screen.queryByTestId('check-note-wanted')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Not right' }));
    await vi.waitFor(() => expect(posted).toEqual([{ checkKey: welds.key, passed: false, note: 'Undercut on the left gusset weld' }]));
  });

  it('shows the recorded result on the buttons: neither solid while open, only "Not right" once failed', () => {
    const { unmount } = renderWithApp(<CheckRecorder workOrderId="wo-1" check={welds} canRecord />);
    expect(screen.getByRole('button', { name: 'Done as described' })).toHaveAttribute('aria-pressed', 'false');
    expect(screen.getByRole('button', { name: 'Done as described' })).not.toHaveClass('ant-btn-variant-solid');
    unmount();
    const failed = { ...welds, latest: { id: 'rec-2', result: 'fail' as const, value: null, note: 'Undercut', recordedByName: 'Dara Quill', recordedAt: '2026-12-03T09:15:00.000Z' }, recordings: 1 };
    renderWithApp(<CheckRecorder workOrderId="wo-1" check={failed} canRecord />);
    expect(screen.getByTestId('check-result')).toHaveTextContent('Failed');
    expect(screen.getByRole('button', { name: 'Done as described' })).toHaveAttribute('aria-pressed', 'false');
    expect(screen.getByRole('button', { name: 'Done as described' })).not.toHaveClass('ant-btn-variant-solid');
    expect(screen.getByRole('button', { name: 'Not right' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByRole('button', { name: 'Not right' })).toHaveClass('ant-btn-variant-solid');
  });
});
