import { Form } from 'antd';
import type { ReactNode } from 'react';
import { BoundedNumberInput } from '@/components/bounded-number-input';

export type NumberFieldProps = {
  label: string;
  name: string;
  extra?: ReactNode;
  /** Message when left empty; without it the box may be left empty. */
  requiredMessage?: string;
  min: number;
  max: number;
  /** Message when the figure is outside [min, max]. */
  rangeMessage: string;
  precision: number;
  step: number;
  prefix?: string;
  suffix?: string;
};

/** A labelled number box of a settings form, bounded, its label doubling as the box's accessible name. */
export function NumberField({ label, name, extra, requiredMessage, min, max, rangeMessage, precision, step, prefix, suffix }: NumberFieldProps) {
  return (
    <Form.Item
      label={label}
      name={name}
      extra={extra}
      rules={[...(requiredMessage ? [{ required: true, message: requiredMessage }] : []), { type: 'number', min, max, message: rangeMessage }]}
    >
      <BoundedNumberInput style={{ width: '100%' }} min={min} max={max} precision={precision} step={step} prefix={prefix} suffix={suffix} aria-label={label} />
    </Form.Item>
  );
}
