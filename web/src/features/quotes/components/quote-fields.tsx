import { Form, Radio } from 'antd';
import { BoundedNumberInput, plainNumberRule, type BoundedNumberInputProps } from '@/components/bounded-number-input';

export interface NumberFieldProps extends Omit<BoundedNumberInputProps, 'name' | 'required'> {
  label: string;
  name: string;
  /** Said when the box is left empty. */
  required: string;
  /** A plain figure shown when the typed text is not one. */
  example: string;
}

/** A required number box of the quote forms, labelled for people and for screen readers alike. */
export function NumberField({ label, name, required, example, ...input }: NumberFieldProps) {
  return (
    <Form.Item label={label} name={name} validateFirst rules={[{ required: true, message: required }, plainNumberRule(label, example)]}>
      <BoundedNumberInput aria-label={label} style={{ width: '100%' }} {...input} />
    </Form.Item>
  );
}

export interface ChoiceFieldProps {
  label: string;
  name: string;
  options: { value: string; label: string }[];
}

/** A choice of a few options as a row of buttons. */
export function ChoiceField({ label, name, options }: ChoiceFieldProps) {
  return (
    <Form.Item label={label} name={name}>
      <Radio.Group optionType="button" options={options} />
    </Form.Item>
  );
}
