import { InputNumber, type InputNumberProps } from 'antd';
import { useRef } from 'react';

export type BoundedNumberInputProps = Omit<InputNumberProps<number>, 'changeOnBlur'>;

const roundTo = (v: number, precision: number | undefined) => (precision === undefined ? v : Math.round(v * 10 ** precision) / 10 ** precision);

/** A plain figure as people type it: digits, an optional sign and decimal point, thousands commas allowed. */
const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

/** Form rule for a number box: refuses text that is not a plain number (the box passes it on as NaN). */
export const plainNumberRule = (label: string, example: string) => ({
  validator: async (_: unknown, v: unknown) => {
    if (typeof v === 'number' && Number.isNaN(v)) throw new Error(`${label}: type a plain number, for example ${example}.`);
  },
});

/** Form rule: a figure inside [min, max], the bounds said as `shown` writes them ("at least 0.02 in (0.5 mm)"). */
export const rangeRule = (label: string, bounds: { min?: number; max?: number }, shown: (v: number) => string = String) => ({
  validator: async (_: unknown, v: unknown) => {
    if (typeof v !== 'number' || Number.isNaN(v)) return;
    if (bounds.min !== undefined && v < bounds.min) throw new Error(`${label} must be at least ${shown(bounds.min)}.`);
    if (bounds.max !== undefined && v > bounds.max) throw new Error(`${label} must be at most ${shown(bounds.max)}.`);
  },
});

/**
 * A number box for forms: `min`/`max` bound the arrows, but a typed figure outside them is passed on as typed
 * (not pulled to the nearest limit), so the Form.Item rules can say what is wrong. Text that is not a plain number
 * (`12 1/2"`, `abc`) is passed on as NaN rather than read as whatever digits it holds.
 */
export function BoundedNumberInput({ onChange, onInput, min, max, precision, value, ...rest }: BoundedNumberInputProps) {
  // what was typed, shown again as typed while the form holds NaN for it (never "NaN")
  const typed = useRef('');
  const outside = (n: number) => (min !== undefined && n < Number(min)) || (max !== undefined && n > Number(max));
  return (
    <InputNumber<number>
      {...rest}
      value={typeof value === 'number' && Number.isNaN(value) ? (typed.current as unknown as number) : value}
      min={min}
      max={max}
      precision={precision}
      changeOnBlur={false}
      onInput={(text) => {
        onInput?.(text);
        typed.current = text;
        const trimmed = text.replace(/,/g, '').trim();
        if (trimmed === '') return;
        if (!PLAIN_NUMBER.test(trimmed)) {
          onChange?.(Number.NaN);
          return;
        }
        const n = Number(trimmed);
        if (Number.isFinite(n) && outside(n)) onChange?.(roundTo(n, precision));
      }}
      onChange={(v) => onChange?.(typeof v === 'number' ? roundTo(v, precision) : v)}
    />
  );
}
