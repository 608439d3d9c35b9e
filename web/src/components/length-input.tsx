import { Input } from 'antd';
import { useEffect, useRef, useState, type CSSProperties } from 'react';
import { useUnits, type UnitsApi } from '@/hooks/use-units';

export type LengthInputProps = {
  /** Millimetres; NaN while the typed text cannot be read as a length. */
  value?: number | null;
  /** Called with millimetres, null when emptied, or NaN when the text is not a length (forms refuse NaN). */
  onChange?: (mm: number | null) => void;
  id?: string;
  'aria-label'?: string;
  placeholder?: string;
  style?: CSSProperties;
  size?: 'small' | 'middle' | 'large';
};

/** The figure as the box shows it: inches to 0.01, millimetres to 0.1. */
function shown(mm: number | null | undefined, units: UnitsApi): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '';
  const v = units.toDisplay(mm);
  return units.system === 'in' ? v.toFixed(2) : String(v);
}

/** What is wrong with a typed length, in words, or null when it reads. */
export function lengthInputProblem(text: string, units: Pick<UnitsApi, 'parseLength'>): string | null {
  if (text.trim() === '') return null;
  return units.parseLength(text) === null ? `Cannot read “${text.trim()}” as a length: type for example 12 1/2, 12.5 in or 318 mm.` : null;
}

/** Form rule for a length box: refuses text that was not a length. */
export const readableLengthRule = (label: string) => ({
  validator: async (_: unknown, v: unknown) => {
    if (typeof v === 'number' && Number.isNaN(v)) throw new Error(`${label}: cannot read that as a length. Type for example 12 1/2, 12.5 in or 318 mm.`);
  },
});

/**
 * A length typed in the person's unit (fractions, decimals, or with a unit: `12 1/2`, `12.5 in`, `318 mm`), read by the
 * shared parser and kept in millimetres. Text that is not a length is kept as typed and marked, never turned into 0.
 */
export function LengthInput({ value, onChange, id, placeholder, style, size, ...rest }: LengthInputProps) {
  const units = useUnits();
  const [text, setText] = useState(() => shown(value, units));
  const [touched, setTouched] = useState(false);
  const last = useRef<{ value: number | null | undefined; system: string }>({ value, system: units.system });

  // a new value from outside (or a switch of unit) replaces what the box shows; our own echo does not
  useEffect(() => {
    const before = last.current;
    const ours = before.value === value || (typeof value === 'number' && typeof before.value === 'number' && Math.abs(value - before.value) < 1e-9);
    if (!ours || before.system !== units.system) {
      if (!(typeof value === 'number' && Number.isNaN(value))) setText(shown(value, units));
    }
    last.current = { value, system: units.system };
  }, [value, units]);

  const problem = lengthInputProblem(text, units);
  const showProblem = touched && problem !== null;

  return (
    <div style={{ width: '100%', ...style }}>
      <Input
        id={id}
        aria-label={rest['aria-label']}
        aria-invalid={problem !== null || undefined}
        inputMode="decimal"
        size={size}
        placeholder={placeholder}
        status={showProblem ? 'error' : undefined}
        suffix={units.unitLabel}
        value={text}
        onBlur={() => setTouched(true)}
        onChange={(e) => {
          const next = e.target.value;
          setText(next);
          const mm = next.trim() === '' ? null : (units.parseLength(next) ?? Number.NaN);
          last.current = { value: mm, system: units.system };
          onChange?.(mm);
        }}
      />
      {showProblem && (
        <div role="alert" style={{ color: '#a8071a', fontSize: 12, marginTop: 2 }}>
          {problem}
        </div>
      )}
    </div>
  );
}
