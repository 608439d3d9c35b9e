import { Segmented } from 'antd';
import type { ReactNode } from 'react';

export type FilterStripProps<T extends string> = {
  label: string;
  options: { value: T; label: ReactNode }[];
  value: T;
  onChange: (value: T) => void;
};

/**
 * A list's filter as one segmented strip. Where its choices do not fit on one line (a phone) they wrap onto the next
 * (`.filter-strip` in global.css), so every choice stays in sight: none hides past the edge of the card.
 */
export function FilterStrip<T extends string>({ label, options, value, onChange }: FilterStripProps<T>) {
  return (
    <div style={{ marginBottom: 12 }}>
      <Segmented<T> className="filter-strip" aria-label={label} options={options} value={value} onChange={onChange} />
    </div>
  );
}
