import { Form, Radio } from 'antd';

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
