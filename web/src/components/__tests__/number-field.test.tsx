import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Form } from 'antd';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { NumberField } from '../number-field';

function Harness({ optional = false }: { optional?: boolean }) {
  const [form] = Form.useForm<{ tax?: number; hours?: number }>();
  return (
    <Form form={form}>
      <NumberField label="Sales tax" name="tax" example="8.25" required={optional ? undefined : 'Enter the tax rate (0 if none)'} min={0} max={100} rangeMessage="Between 0 and 100 %" precision={2} />
      <NumberField label="Hours" name="hours" example="3.5" required="Enter the hours, to a tenth" min={0} max={999} step={0.1} suffix="h" />
      <button type="button" onClick={() => void form.validateFields().catch(() => undefined)}>
        Check
      </button>
    </Form>
  );
}

describe('NumberField', () => {
  it('says what is missing, what is not a number and what is out of range, one message at a time', async () => {
    renderWithApp(<Harness />);
    fireEvent.click(screen.getByRole('button', { name: 'Check' }));
    expect(await screen.findByText('Enter the tax rate (0 if none)')).toBeInTheDocument();
    expect(screen.getByText('Enter the hours, to a tenth')).toBeInTheDocument();

    const tax = screen.getByRole('spinbutton', { name: 'Sales tax' });
    fireEvent.change(tax, { target: { value: 'eight' } });
    fireEvent.blur(tax);
    expect(await screen.findByText('Sales tax: type a plain number, for example 8.25.')).toBeInTheDocument();

    fireEvent.change(tax, { target: { value: '150' } });
    expect(await screen.findByText('Between 0 and 100 %')).toBeInTheDocument();
    expect(screen.queryByText('Sales tax: type a plain number, for example 8.25.')).toBeNull();

    fireEvent.change(tax, { target: { value: '7.5' } });
    await waitFor(() => expect(screen.queryByText('Between 0 and 100 %')).toBeNull());
  });

  it('may be left empty when it names no message for that', async () => {
    renderWithApp(<Harness optional />);
    fireEvent.click(screen.getByRole('button', { name: 'Check' }));
    expect(await screen.findByText('Enter the hours, to a tenth')).toBeInTheDocument();
    expect(screen.queryByText('Enter the tax rate (0 if none)')).toBeNull();
    expect(screen.getByRole('spinbutton', { name: 'Hours' }).closest('.ant-input-number')).toHaveTextContent('h');
  });
});
