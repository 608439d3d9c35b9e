import type { CSSProperties } from 'react';
import { InputNumber } from 'antd';
import { useUnits } from '@/hooks/use-units';

export type LengthInputProps = {
  /** Millimetres. */
  value?: number | null;
  onChange?: (mm: number | null) => void;
  id?: string;
  'aria-label'?: string;
  placeholder?: string;
  style?: CSSProperties;
  size?: 'small' | 'middle' | 'large';
};

/** A length typed in the person's unit and kept in millimetres. */
export function LengthInput({ value, onChange, id, placeholder, style, size, ...rest }: LengthInputProps) {
  const units = useUnits();
  return (
    <InputNumber
      id={id}
      aria-label={rest['aria-label']}
      size={size}
      placeholder={placeholder}
      style={{ width: '100%', ...style }}
      step={units.system === 'in' ? 0.01 : 1}
      suffix={units.unitLabel}
      value={value === null || value === undefined ? null : units.toDisplay(value)}
      onChange={(v) => onChange?.(typeof v === 'number' && Number.isFinite(v) ? units.fromDisplay(v) : null)}
    />
  );
}
