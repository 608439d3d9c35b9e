import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { useQuote } from '../../api/get-quote';
import { quoteKeys } from '../../api/quote-keys';
import { formToInput, hoursProblem, toCents } from '../../quote-line-input';
import type { LaborOperation } from '../../types';
import { QuoteLineEditor } from '../quote-line-editor';
import { LINES, quoteStub, TOTALS } from './quote-stub';

const OPERATIONS = [
  { id: 'op-engine', code: 'engine-remove-install', name: 'Remove and install engine', bookHours: 8.5 },
  { id: 'op-crossmember', code: 'crossmember-notch', name: 'Modify front crossmember', bookHours: 3.5 },
] as LaborOperation[];

type PatchBody = { lines: Record<string, unknown>[] };

/** The editor as a page holds it: on the quote's query, which the save updates. */
function EditorOnQuery() {
  const quote = useQuote('quote-7');
  return quote.data ? <QuoteLineEditor quote={quote.data} defaultMarkupPercent={35} /> : null;
}

function renderEditor() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(quoteKeys.laborOperations(), OPERATIONS);
  queryClient.setQueryData(quoteKeys.detail('quote-7'), quoteStub());
  return renderWithApp(<EditorOnQuery />, { queryClient });
}

describe('QuoteLineEditor', () => {
  it('changes a quantity: sends every line back with its key and shows the total the API priced', async () => {
    // Hand-worked for the mocked answer: pickup 55.85 x 3 = 167.55; parts 289.95 + 167.55 = 457.50;
    // tax 457.50 x 8.25 % = 37.74375 -> 37.74; total 457.50 + 1,323.00 + 52.92 + 37.74 = 1,871.16.
    const repriced = quoteStub({
      lines: LINES.map((line) => (line.key === 'line-pickup' ? { ...line, quantity: 3, lineTotalCents: 16755 } : line)),
      totals: { ...TOTALS, partsSubtotalCents: 45750, partsTaxCents: 3774, taxCents: 3774, totalCents: 187116, depositCents: 56135 },
    });
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: repriced });
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: repriced });
    renderEditor();
    expect(screen.getByTestId('quote-total')).toHaveTextContent('$1,810.71');
    expect(screen.getByText('Part no. TR-4410')).toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Edit Pickup tube and screen' }));
    const form = await screen.findByRole('form', { name: 'Edit parts line' });
    expect(within(form).getByRole('spinbutton', { name: 'Unit cost' })).toHaveValue('41.37');
    fireEvent.change(within(form).getByRole('spinbutton', { name: 'Quantity' }), { target: { value: '3' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));

    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    const [url, body] = patch.mock.calls[0] as [string, PatchBody];
    expect(url).toBe('/quotes/quote-7');
    expect(body.lines.map((line) => line.key)).toEqual(['line-pan', 'line-pickup', 'line-engine', 'line-install']);
    expect(body.lines[1]).toEqual({
      key: 'line-pickup',
      kind: 'part',
      description: 'Pickup tube and screen',
      sku: null,
      catalogKind: null,
      catalogItemId: null,
      quantity: 3,
      pricing: 'cost-plus',
      unitCostCents: 4137,
      markupPercent: 35,
    });
    // The other lines go back as the estimator set them (the list price, not a worked-out figure).
    expect(body.lines[0]).toMatchObject({ sku: 'TR-4410', unitPriceCents: 28995, catalogItemId: 'part-1' });
    expect(body.lines[2]).toEqual({ key: 'line-engine', kind: 'labor', description: 'Remove and install engine', laborOperationId: 'op-engine', hours: 8.5 });

    // The editor shows the API's answer (the mutation writes it to the quote's query).
    await waitFor(() => expect(screen.getByTestId('quote-total')).toHaveTextContent('$1,871.16'));
    expect(screen.queryByRole('form', { name: 'Edit parts line' })).not.toBeInTheDocument();
  });

  it('adds a labor line from the shop operations: the operation fills in its book hours', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: quoteStub() });
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Add labor line' }));
    const form = await screen.findByRole('form', { name: 'Add a labor line' });
    await userEvent.click(within(form).getByLabelText('Operation'));
    await userEvent.click(await screen.findByText('Modify front crossmember · 3.5 h'));
    expect(within(form).getByRole('spinbutton', { name: 'Hours' })).toHaveValue('3.5');
    expect(within(form).getByRole('textbox', { name: 'Description' })).toHaveValue('Modify front crossmember');
    await userEvent.click(screen.getByRole('button', { name: 'Add line' }));
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    const body = patch.mock.calls[0][1] as PatchBody;
    expect(body.lines).toHaveLength(5);
    expect(body.lines[4]).toEqual({ kind: 'labor', description: 'Modify front crossmember', laborOperationId: 'op-crossmember', hours: 3.5 });
  });

  it('labels the required pricing choice as required and says in plain words what price the line will take', async () => {
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Add parts line' }));
    const form = await screen.findByRole('form', { name: 'Add a parts line' });
    const pricing = within(form).getByRole('radiogroup', { name: 'Price each part by' });
    const label = within(form).getByText('Price each part by').closest('label') as HTMLElement;
    expect(label).not.toHaveTextContent(/optional/i);
    expect(within(pricing).getByRole('radio', { name: 'Unit price' })).toBeChecked();
    const note = within(form).getByTestId('line-price-note');
    expect(note).toHaveTextContent('The line charges the unit price times the quantity.');
    expect(note).not.toHaveTextContent(/server/i);

    await userEvent.click(within(pricing).getByText('Cost and markup'));
    expect(note).toHaveTextContent('Each part is charged at its cost plus the markup, to the nearest cent, times the quantity.');
  });

  it('removes a line after asking', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: quoteStub() });
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Remove Install pan and pickup' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Remove' }));
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    expect((patch.mock.calls[0][1] as PatchBody).lines.map((line) => line.key)).toEqual(['line-pan', 'line-pickup', 'line-engine']);
  });

  it("shows the API's refusal inside the line form and keeps the form open", async () => {
    const detail = 'line 5 (part) needs unitPriceCents, or pricing cost-plus with unitCostCents and markupPercent';
    vi.spyOn(apiClient, 'patch').mockRejectedValue(
      new AxiosError('400', 'ERR_BAD_REQUEST', undefined, undefined, {
        status: 400,
        statusText: 'Bad Request',
        headers: {},
        config: {} as never,
        data: { statusCode: 400, error: 'Bad Request', code: 'validation_failed', message: 'The request has invalid fields.', details: [detail] },
      }),
    );
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Add parts line' }));
    const form = await screen.findByRole('form', { name: 'Add a parts line' });
    fireEvent.change(within(form).getByRole('textbox', { name: 'Description' }), { target: { value: 'Pan gasket set' } });
    fireEvent.change(within(form).getByRole('spinbutton', { name: 'Unit price' }), { target: { value: '24.50' } });
    await userEvent.click(screen.getByRole('button', { name: 'Add line' }));
    const alert = await within(form).findByRole('alert');
    expect(alert).toHaveTextContent('The request has invalid fields.');
    expect(alert).toHaveTextContent(detail);
  });

  it('checks the hours before sending: 0 or more, to a tenth, said beside the field', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: quoteStub() });
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Edit Install pan and pickup' }));
    const form = await screen.findByRole('form', { name: 'Edit labor line' });
    const hours = within(form).getByRole('spinbutton', { name: 'Hours' });

    fireEvent.input(hours, { target: { value: '-3' } });
    fireEvent.change(hours, { target: { value: '-3' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    expect(await within(form).findByText('Hours cannot be negative: enter 0 or more.')).toBeInTheDocument();

    fireEvent.input(hours, { target: { value: '2.25' } });
    fireEvent.change(hours, { target: { value: '2.25' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    expect(await within(form).findByText('Hours are quoted to a tenth of an hour: enter 2.2 or 2.3.')).toBeInTheDocument();
    expect(patch).not.toHaveBeenCalled();

    fireEvent.input(hours, { target: { value: '2.3' } });
    fireEvent.change(hours, { target: { value: '2.3' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    expect((patch.mock.calls[0][1] as PatchBody).lines[3]).toMatchObject({ key: 'line-install', hours: 2.3 });
  });

  it('checks a quantity before sending: whole parts from 1 to 10,000, said beside the field, never rounded', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: quoteStub() });
    renderEditor();
    await userEvent.click(screen.getByRole('button', { name: 'Edit Pickup tube and screen' }));
    const form = await screen.findByRole('form', { name: 'Edit parts line' });
    const quantity = within(form).getByRole('spinbutton', { name: 'Quantity' });

    fireEvent.input(quantity, { target: { value: '1.5' } });
    fireEvent.change(quantity, { target: { value: '1.5' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    expect(await within(form).findByText('Quantity is a whole number of parts (1, 2, 3…)')).toBeInTheDocument();

    fireEvent.input(quantity, { target: { value: '-1' } });
    fireEvent.change(quantity, { target: { value: '-1' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    expect(await within(form).findByText('Quantity is from 1 to 10,000')).toBeInTheDocument();
    expect(patch).not.toHaveBeenCalled();
  });

  it('says what is wrong with hours in words', () => {
    // Common practice (no published source): labor is quoted to a tenth of an hour (6 minutes).
    expect(hoursProblem(2.2)).toBeNull();
    expect(hoursProblem(0)).toBeNull();
    expect(hoursProblem(999)).toBeNull();
    expect(hoursProblem(-3)).toBe('Hours cannot be negative: enter 0 or more.');
    expect(hoursProblem(1000)).toBe('Hours must be at most 999 on one line.');
    expect(hoursProblem(2.25)).toBe('Hours are quoted to a tenth of an hour: enter 2.2 or 2.3.');
    // Binary floating point: 0.1 + 0.2 is 0.30000000000000004, still three tenths.
    expect(hoursProblem(0.1 + 0.2)).toBeNull();
  });

  it("clears the API's refusal on Cancel and on a later success, so no old red banner stays on the quote", async () => {
    const refusal = new AxiosError('400', 'ERR_BAD_REQUEST', undefined, undefined, {
      status: 400,
      statusText: 'Bad Request',
      headers: {},
      config: {} as never,
      data: { statusCode: 400, error: 'Bad Request', code: 'validation_failed', message: 'Line 4 (Install pan and pickup): hours must be 0 or more', details: [] },
    });
    const patch = vi.spyOn(apiClient, 'patch').mockRejectedValueOnce(refusal).mockRejectedValueOnce(refusal).mockResolvedValue({ data: quoteStub() });
    renderEditor();
    // a refused edit, then Cancel: the quote shows no banner
    await userEvent.click(screen.getByRole('button', { name: 'Edit Install pan and pickup' }));
    await userEvent.click(screen.getByRole('button', { name: 'Save line' }));
    const form = await screen.findByRole('form', { name: 'Edit labor line' });
    expect(await within(form).findByRole('alert')).toHaveTextContent('Line 4 (Install pan and pickup): hours must be 0 or more');
    await userEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('form', { name: 'Edit labor line' })).not.toBeInTheDocument());
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();

    // a refused removal shows on the quote until a later save succeeds
    await userEvent.click(screen.getByRole('button', { name: 'Remove Install pan and pickup' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Remove' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('hours must be 0 or more');
    await userEvent.click(screen.getByRole('button', { name: 'Remove Install pan and pickup' }));
    await userEvent.click((await screen.findAllByRole('button', { name: 'Remove' })).at(-1)!);
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(3));
    await waitFor(() => expect(screen.queryByRole('alert')).not.toBeInTheDocument());
  });

  it('on a phone stacks each line: name, how many at what price, amount and its commands, with no sideways scrolling', async () => {
    setWindowWidth(390);
    const patch = vi.spyOn(apiClient, 'patch').mockResolvedValue({ data: quoteStub() });
    renderEditor();
    // the only table left is the totals' two columns
    expect(screen.getAllByRole('table')).toEqual([screen.getByRole('table', { name: 'Totals' })]);
    const list = screen.getByRole('list', { name: 'Quote lines' });
    const items = within(list).getAllByRole('listitem');
    expect(items).toHaveLength(4);
    // Hand-worked from the stub: pickup 2 x 55.85 = 111.70; labor 8.5 h x 135.00 = 1,147.50.
    const pickup = screen.getByTestId('quote-line-line-pickup');
    expect(pickup).toHaveTextContent('Pickup tube and screen');
    expect(within(pickup).getByLabelText('Quantity and unit price')).toHaveTextContent('2 × $55.85');
    expect(within(pickup).getByLabelText('Line amount')).toHaveTextContent('$111.70');
    const engine = screen.getByTestId('quote-line-line-engine');
    expect(engine).toHaveTextContent('Labor');
    expect(within(engine).getByLabelText('Quantity and unit price')).toHaveTextContent('8.5 h × $135.00');
    expect(within(engine).getByLabelText('Line amount')).toHaveTextContent('$1,147.50');
    expect(screen.getByTestId('quote-line-line-pan')).toHaveTextContent('Part no. TR-4410');
    expect(screen.getByTestId('quote-total')).toHaveTextContent('$1,810.71');

    await userEvent.click(within(screen.getByTestId('quote-line-line-install')).getByRole('button', { name: 'Remove Install pan and pickup' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Remove' }));
    await waitFor(() => expect(patch).toHaveBeenCalledTimes(1));
    expect((patch.mock.calls[0][1] as PatchBody).lines.map((line) => line.key)).toEqual(['line-pan', 'line-pickup', 'line-engine']);
  });

  it('on a wide screen keeps the table with money in the one style', () => {
    setWindowWidth(1440);
    renderEditor();
    const row = screen.getByTestId('quote-line-line-pickup');
    expect(row.tagName).toBe('TR');
    expect(row).toHaveTextContent(/Pickup tube and screen.*2.*\$55\.85.*\$111\.70/);
  });

  it('turns typed amounts into whole cents once', () => {
    // Hand-checked: 289.95 is 28,995 cents although 289.95 x 100 is 28,994.999… in binary floating point.
    expect(toCents(289.95)).toBe(28995);
    expect(toCents(41.37)).toBe(4137);
    expect(formToInput('part', { description: ' Gasket ', sku: ' GS-100 ', quantity: 2, pricing: 'list', unitPrice: 24.5 })).toEqual({
      kind: 'part',
      description: 'Gasket',
      sku: 'GS-100',
      catalogKind: null,
      catalogItemId: null,
      quantity: 2,
      pricing: 'list',
      unitPriceCents: 2450,
    });
  });
});
