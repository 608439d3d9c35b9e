import { Segmented } from 'antd';
import type { ReactNode } from 'react';

export type FilterStripProps<T extends string> = {
  label: string;
  options: { value: T; label: ReactNode }[];
  value: T;
  onChange: (value: T) => void;
};

/** A list's filter as one segmented strip that scrolls sideways on its own on a phone, instead of the page. */
export function FilterStrip<T extends string>({ label, options, value, onChange }: FilterStripProps<T>) {
  return (
    <div style={{ overflowX: 'auto', marginBottom: 12 }}>
      <Segmented<T> aria-label={label} options={options} value={value} onChange={onChange} />
    </div>
  );
}
