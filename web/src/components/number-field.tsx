import { Form, type FormRule } from 'antd';
import type { ReactNode } from 'react';
import { BoundedNumberInput, plainNumberRule, type BoundedNumberInputProps } from '@/components/bounded-number-input';

export interface NumberFieldProps extends Omit<BoundedNumberInputProps, 'name' | 'required'> {
  label: string;
  name: string;
  extra?: ReactNode;
  /** Said when the box is left empty; without it the box may be left empty. */
  required?: string;
  /** A plain figure shown when the typed text is not one ("type a plain number, for example 3.5"). */
  example: string;
  /** Said when the figure is outside [min, max]; without it `min`/`max` only bound the arrows. */
  rangeMessage?: string;
  /** More checks of the figure, after the plain-number and range ones. */
  rules?: FormRule[];
}

/** A labelled number box of a form, bounded, its label doubling as the box's accessible name. */
export function NumberField({ label, name, extra, required, example, rangeMessage, rules = [], ...input }: NumberFieldProps) {
  const { min, max } = input;
  return (
    <Form.Item
      label={label}
      name={name}
      extra={extra}
      validateFirst
      rules={[
        ...(required ? [{ required: true, message: required }] : []),
        plainNumberRule(label, example),
        ...(rangeMessage ? [{ type: 'number' as const, min: min === undefined ? undefined : Number(min), max: max === undefined ? undefined : Number(max), message: rangeMessage }] : []),
        ...rules,
      ]}
    >
      <BoundedNumberInput aria-label={label} style={{ width: '100%' }} {...input} />
    </Form.Item>
  );
}
