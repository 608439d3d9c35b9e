import { InputNumber, type InputNumberProps } from 'antd';

export type BoundedNumberInputProps = Omit<InputNumberProps<number>, 'changeOnBlur'>;

const roundTo = (v: number, precision: number | undefined) => (precision === undefined ? v : Math.round(v * 10 ** precision) / 10 ** precision);

/**
 * A number box for forms: `min`/`max` bound the arrows, but a typed figure outside them is passed on as typed
 * (not pulled to the nearest limit), so the Form.Item rules can say what is wrong.
 */
export function BoundedNumberInput({ onChange, onInput, min, max, precision, ...rest }: BoundedNumberInputProps) {
  const outside = (n: number) => (min !== undefined && n < Number(min)) || (max !== undefined && n > Number(max));
  return (
    <InputNumber<number>
      {...rest}
      min={min}
      max={max}
      precision={precision}
      changeOnBlur={false}
      onInput={(text) => {
        onInput?.(text);
        const trimmed = text.replace(/,/g, '').trim();
        const n = Number(trimmed);
        if (trimmed !== '' && Number.isFinite(n) && outside(n)) onChange?.(roundTo(n, precision));
      }}
      onChange={(v) => onChange?.(typeof v === 'number' ? roundTo(v, precision) : v)}
    />
  );
}
