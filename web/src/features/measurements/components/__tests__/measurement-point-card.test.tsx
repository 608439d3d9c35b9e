import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useState } from 'react';
import { AxiosError, AxiosHeaders, type AxiosResponse } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '@/test/render';
import { sheetRows } from '../../lib/sheet-state';
import { sheetStub } from '../../lib/__tests__/sheet-fixture';
import { MeasurementPointCard, type MeasurementPointCardProps } from '../measurement-point-card';
import { SheetOverview } from '../sheet-overview';

const noPhotos: MeasurementPointCardProps['photoActions'] = {
  canAdd: true,
  canDelete: () => false,
  canReview: false,
  pendingLabel: 'From the customer',
  onAdd: () => undefined,
  onRetry: () => undefined,
  onDismiss: () => undefined,
  onDelete: async () => undefined,
  onAccept: () => undefined,
};

function renderCard(props: Partial<MeasurementPointCardProps> = {}) {
  const onSave = vi.fn(async () => undefined);
  const row = sheetRows(sheetStub()).find((r) => r.point.id === 'front-crossmember.top')!;
  renderWithApp(
    <MeasurementPointCard
      row={row}
      system="in"
      formatLength={(mm) => `${mm} mm`}
      signedOff={false}
      canEdit
      onSave={onSave}
      uploads={[]}
      uploadedIds={new Set()}
      photoActions={noPhotos}
      {...props}
    />,
  );
  return { onSave };
}

describe('a point of the sheet', () => {
  it('reads 12 1/2" through the shared parser and saves it in millimetres', async () => {
    const { onSave } = renderCard();
    const box = screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' });
    fireEvent.change(box, { target: { value: '12 1/2"' } });
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly.
    expect(screen.getByTestId('reading-preview')).toHaveTextContent('317.5 mm');
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledWith('front-crossmember.top', { value: '317.5', unit: 'mm', seenVersion: 0 }));
    expect(screen.getByRole('img', { name: 'Where to measure: Front crossmember: top' })).toBeInTheDocument();
    expect(screen.getByText('Missing')).toBeInTheDocument();
  });

  it('warns, before saving, when a reading is most likely in the wrong unit', () => {
    renderCard();
    const box = screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' });
    // Source: NIST SP 811 (2008) B.8: 1 ft = 304.8 mm; 12 1/2 ft = 3810 mm, ten times the catalog's crossmember top.
    fireEvent.change(box, { target: { value: '12 1/2 ft' } });
    expect(screen.getByTestId('reading-preview')).toHaveTextContent('3810 mm');
    expect(screen.getByTestId('unit-slip')).toHaveTextContent(/check the unit\. A bare number is read in inches/);
    // It still saves (the truck may really be that way), after a second yes naming both figures.
    expect(screen.getByRole('button', { name: 'Save reading' })).toBeEnabled();
    fireEvent.change(box, { target: { value: '14' } });
    expect(screen.queryByTestId('unit-slip')).not.toBeInTheDocument();
  });

  it('saves a reading far from the catalog only after a second yes', async () => {
    const { onSave } = renderCard();
    const box = screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' });
    // A bare 135 in an inch shop: 135 in = 3429 mm (NIST SP 811 B.8), most likely 135 mm typed without its unit.
    fireEvent.change(box, { target: { value: '135' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    expect(await screen.findByTestId('unit-slip-confirm')).toHaveTextContent(/It reads as 3429 mm; the catalog has \d+(\.\d+)? mm/);
    expect(onSave).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Fix it' }));
    fireEvent.change(box, { target: { value: '135 mm' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledWith('front-crossmember.top', { value: '135', unit: 'mm', seenVersion: 0 }));
  });

  it('saves the far reading as read when the person says so', async () => {
    const { onSave } = renderCard();
    fireEvent.change(screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' }), { target: { value: '135' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Save as read' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledWith('front-crossmember.top', { value: '3429', unit: 'mm', seenVersion: 0 }));
  });

  it('will not save what it cannot read', () => {
    renderCard();
    fireEvent.change(screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' }), { target: { value: 'twelve' } });
    expect(screen.getByRole('alert')).toHaveTextContent(/twelve/);
    expect(screen.getByRole('button', { name: 'Save reading' })).toBeDisabled();
  });

  it('after sign-off asks for a reason and sends it with the change', async () => {
    const { onSave } = renderCard({ signedOff: true });
    fireEvent.change(screen.getByRole('textbox', { name: 'Reading: Front crossmember: top' }), { target: { value: '335 mm' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    const ok = await screen.findByRole('button', { name: 'Save with this reason' });
    expect(onSave).not.toHaveBeenCalled();
    expect(ok).toBeDisabled();
    fireEvent.change(screen.getByRole('textbox', { name: 'Reason for the change' }), { target: { value: 'Crossmember sits lower than the book' } });
    expect(ok).toBeEnabled();
    fireEvent.click(ok);
    await waitFor(() =>
      expect(onSave).toHaveBeenCalledWith('front-crossmember.top', { value: '335', unit: 'mm', seenVersion: 0, reason: 'Crossmember sits lower than the book' }),
    );
  });

  it('a flagged reading says to take a second look', () => {
    const row = sheetRows(sheetStub()).find((r) => r.point.id === 'front-crossmember.front-face')!;
    renderCard({ row });
    expect(screen.getByText('Far from the catalog: take a second look')).toBeInTheDocument();
    expect(screen.getByTestId('measured-by')).toHaveTextContent('Measured by Sefa Lindqvist-Moro');
  });
});

describe('a reading saved in another tab meanwhile', () => {
  const faceRow = (version: number, value: number, measuredBy = 'Sefa Lindqvist-Moro') => {
    const sheet = sheetStub();
    return sheetRows({ ...sheet, values: sheet.values.map((v) => ({ ...v, version, value, measuredBy, deviation: value - 90 })) }).find(
      (r) => r.point.id === 'front-crossmember.front-face',
    )!;
  };
  const refused = (message: string) => {
    const config = { headers: new AxiosHeaders() };
    const response = { status: 409, statusText: 'Conflict', headers: {}, config, data: { statusCode: 409, error: 'Conflict', code: 'measurement_reading_changed', message, details: [], correlationId: 'c-1' } } as AxiosResponse;
    return new AxiosError(message, 'ERR_BAD_REQUEST', config, undefined, response);
  };
  /** The card inside the app's providers; `showRow` plays the sheet coming back from the server. */
  let showRow: (row: ReturnType<typeof faceRow>) => void = () => undefined;
  function Harness({ first, onSave }: { first: ReturnType<typeof faceRow>; onSave: MeasurementPointCardProps['onSave'] }) {
    const [row, setRow] = useState(first);
    showRow = (next) => act(() => setRow(next));
    return <MeasurementPointCard {...cardProps(row, onSave)} />;
  }
  const cardProps = (row: ReturnType<typeof faceRow>, onSave: MeasurementPointCardProps['onSave']): MeasurementPointCardProps => ({
    row,
    system: 'mm',
    formatLength: (mm) => `${mm} mm`,
    signedOff: false,
    canEdit: true,
    onSave,
    uploads: [],
    uploadedIds: new Set(),
    photoActions: noPhotos,
  });

  it('sends the version it was typed over; refused, it shows theirs and mine and saves over theirs only when asked', async () => {
    const message = 'Ana Quill recorded 17 1/2 in (444.5 mm) here at 14:05 UTC; yours (17 1/2 in (445.0 mm)) was not saved. Keep theirs, or save yours over it.';
    const onSave = vi.fn<MeasurementPointCardProps['onSave']>().mockRejectedValueOnce(refused(message)).mockResolvedValue(undefined);
    // the card shows version 2 (110 mm) when the person starts typing
    renderWithApp(<Harness first={faceRow(2, 110)} onSave={onSave} />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Reading: Front crossmember: front face' }), { target: { value: '445 mm' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save new reading' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledWith('front-crossmember.front-face', { value: '445', unit: 'mm', seenVersion: 2 }));

    const conflict = await screen.findByTestId('reading-conflict');
    expect(conflict).toHaveTextContent(message);
    expect(screen.getByTestId('conflict-yours')).toHaveTextContent('445 mm');
    // until their reading is fetched, there is nothing to choose between
    expect(screen.getByTestId('conflict-theirs')).toHaveTextContent('Loading…');
    expect(screen.getByRole('button', { name: 'Save mine over it' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Save new reading' })).toBeDisabled();

    // the sheet comes back with theirs: 17 1/2 in, version 3 (Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly)
    showRow(faceRow(3, 444.5, 'Ana Quill'));
    expect(screen.getByTestId('point-value')).toHaveTextContent('444.5 mm');
    expect(screen.getByTestId('conflict-theirs')).toHaveTextContent('444.5 mm (Ana Quill,');
    expect(screen.getByTestId('conflict-yours')).toHaveTextContent('445 mm');
    fireEvent.click(screen.getByRole('button', { name: 'Save mine over it' }));
    await waitFor(() => expect(onSave).toHaveBeenLastCalledWith('front-crossmember.front-face', { value: '445', unit: 'mm', seenVersion: 3 }));
    await waitFor(() => expect(screen.queryByTestId('reading-conflict')).not.toBeInTheDocument());
    expect(onSave).toHaveBeenCalledTimes(2);
  });

  it('keeping theirs drops what was typed and saves nothing', async () => {
    const onSave = vi.fn<MeasurementPointCardProps['onSave']>().mockRejectedValueOnce(refused('Ana Quill recorded 444.5 mm here.'));
    renderWithApp(<Harness first={faceRow(2, 110)} onSave={onSave} />);
    const box = screen.getByRole('textbox', { name: 'Reading: Front crossmember: front face' });
    fireEvent.change(box, { target: { value: '445' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save new reading' }));
    await screen.findByTestId('reading-conflict');
    showRow(faceRow(3, 444.5, 'Ana Quill'));
    fireEvent.click(screen.getByRole('button', { name: 'Keep theirs' }));
    expect(screen.queryByTestId('reading-conflict')).not.toBeInTheDocument();
    expect(box).toHaveValue('');
    expect(onSave).toHaveBeenCalledTimes(1);
  });
});

describe('the sheet overview', () => {
  it('lists what is missing and holds sign-off until it is measured', () => {
    renderWithApp(
      <SheetOverview
        counts={{ total: 4, required: 3, requiredMeasured: 1, missing: 2, measured: 1, flagged: 1 }}
        filter="missing"
        onFilter={() => undefined}
        missingLabels={['Front crossmember: top', 'Pinion: angle']}
        signedOffAt={null}
        signOff={null}
        canSignOff
        signingOff={false}
        onSignOff={() => undefined}
      />,
    );
    expect(screen.getByTestId('sheet-counts')).toHaveTextContent('1 of 3 required points measured');
    // one point a line, in order, each its own list item a fabricator can work down
    const list = within(screen.getByTestId('missing-list'));
    expect(list.getByRole('list', { name: 'Still to measure (2):' })).toBeInTheDocument();
    expect(list.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Front crossmember: top', 'Pinion: angle']);
    expect(screen.getByRole('button', { name: 'Sign off (measure 2 more first)' })).toBeDisabled();
  });
});
