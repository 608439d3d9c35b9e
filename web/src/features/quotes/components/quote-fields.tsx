import { Form, Radio } from 'antd';

export interface ChoiceFieldProps {
  label: string;
  name: string;
  options: { value: string; label: string }[];
  /** The message when nothing is chosen; the choice is then required (no "optional" beside its label). */
  required?: string;
}

/** A choice of a few options as a row of buttons. */
export function ChoiceField({ label, name, options, required }: ChoiceFieldProps) {
  return (
    <Form.Item label={label} name={name} rules={required ? [{ required: true, message: required }] : undefined}>
      <Radio.Group optionType="button" options={options} aria-label={label} />
    </Form.Item>
  );
}
