import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Form } from 'antd';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { BoundedNumberInput, plainNumberRule } from '../bounded-number-input';

let form: ReturnType<typeof Form.useForm<{ tax: number }>>[0] | undefined;

function Harness() {
  const [f] = Form.useForm<{ tax: number }>();
  form = f;
  return (
    <Form form={f} initialValues={{ tax: 8 }}>
      <Form.Item name="tax" label="Sales tax" rules={[{ type: 'number', min: 0, max: 100, message: 'Between 0 and 100 %' }]}>
        <BoundedNumberInput min={0} max={100} precision={2} aria-label="Sales tax" />
      </Form.Item>
    </Form>
  );
}

function PowerHarness() {
  const [f] = Form.useForm<{ power: number }>();
  return (
    <Form form={f}>
      <Form.Item name="power" label="Target power" rules={[plainNumberRule('Target power', '350'), { type: 'number', min: 1, max: 2681, message: 'Between 1 and 2,681 hp' }]}>
        <BoundedNumberInput min={1} max={2681} precision={0} aria-label="Target power" />
      </Form.Item>
    </Form>
  );
}

describe('BoundedNumberInput', () => {
  it('refuses a figure that is not a plain number instead of reading its digits', async () => {
    renderWithApp(<PowerHarness />);
    const input = screen.getByRole('spinbutton', { name: 'Target power' }) as HTMLInputElement;
    fireEvent.change(input, { target: { value: '12 1/2"' } });
    fireEvent.blur(input);
    expect(await screen.findByText('Target power: type a plain number, for example 350.')).toBeInTheDocument();
    fireEvent.change(input, { target: { value: '350' } });
    await waitFor(() => expect(screen.queryByText('Target power: type a plain number, for example 350.')).not.toBeInTheDocument());
  });

  it('keeps an out-of-range figure as typed and lets the rule say why', async () => {
    renderWithApp(<Harness />);
    const input = screen.getByRole('spinbutton', { name: 'Sales tax' }) as HTMLInputElement;
    fireEvent.change(input, { target: { value: '150' } });
    fireEvent.blur(input);
    await waitFor(() => expect(screen.getByText('Between 0 and 100 %')).toBeInTheDocument());
    expect(form?.getFieldValue('tax')).toBe(150);
    expect(input.value).toBe('150.00');

    fireEvent.change(input, { target: { value: '-5' } });
    await waitFor(() => expect(form?.getFieldValue('tax')).toBe(-5));
    expect(screen.getByText('Between 0 and 100 %')).toBeInTheDocument();

    fireEvent.change(input, { target: { value: '7.5' } });
    await waitFor(() => expect(screen.queryByText('Between 0 and 100 %')).toBeNull());
    expect(form?.getFieldValue('tax')).toBe(7.5);
  });
});
