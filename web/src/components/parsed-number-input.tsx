import { Input } from 'antd';
import { useEffect, useRef, useState, type CSSProperties, type KeyboardEvent } from 'react';
import type { ReadResult } from '@/lib/units';

export type ParsedNumberInputProps = {
  /** The value held, in the unit the caller stores (millimetres for a length). */
  value: number;
  /** Called only with a value read from the text and inside `min`..`max`; never with a clamped one. */
  onChange: (value: number) => void;
  /** Reads typed text into the stored unit, or says what it could not read. */
  read: (text: string) => ReadResult;
  /** The stored value as the person reads it (inches or mm for a length); shown in the box. */
  toDisplay?: (value: number) => number;
  min: number;
  max: number;
  /** What to say when a typed value reads but lies outside the limits. */
  rangeMessage: string;
  /** The field's name, for the accessible name and the start of a message. */
  label: string;
  /** Step of the arrow keys, in the stored unit. */
  step: number;
  suffix?: string;
  /**
   * The problem with what is typed, or null once it reads and fits. A value outside the limits is reported as it is
   * typed; text that does not read is reported when the person leaves the box or presses Enter (not mid-fraction).
   */
  onProblem?: (message: string | null) => void;
  /** Marks the box as wrong for a reason the parent knows (a stored value outside the limits). */
  invalid?: boolean;
  style?: CSSProperties;
};

const identity = (v: number) => v;

/**
 * A number box that reads what a person types through a parser (fractions, decimals and units for lengths),
 * refuses what is outside the limits with a message instead of pulling it to the nearest limit, and keeps the
 * text as typed until it reads.
 */
export function ParsedNumberInput({
  value,
  onChange,
  read,
  toDisplay = identity,
  min,
  max,
  rangeMessage,
  label,
  step,
  suffix,
  onProblem,
  invalid,
  style,
}: ParsedNumberInputProps) {
  const [draft, setDraft] = useState<string | null>(null);
  const [unread, setUnread] = useState(false);
  const [outside, setOutside] = useState(false);
  const emitted = useRef<number | null>(null);

  const report = (message: string | null) => onProblem?.(message);

  // A value set from outside (slider, reset, proposal) replaces whatever was typed.
  useEffect(() => {
    if (emitted.current !== null && Math.abs(emitted.current - value) < 1e-9) return;
    emitted.current = null;
    setDraft(null);
    setUnread(false);
    setOutside(false);
    onProblem?.(null);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only a new value from outside resets the box
  }, [value]);

  const emit = (next: number) => {
    emitted.current = next;
    onChange(next);
  };

  /** Reads the text; `final` when the person is done typing (blur, Enter). */
  const check = (text: string, final: boolean) => {
    const result = read(text);
    if (!result.ok) {
      setUnread(true);
      setOutside(false);
      report(final ? `${label}: ${result.message}` : null);
      return;
    }
    setUnread(false);
    if (result.value < min || result.value > max) {
      setOutside(true);
      report(rangeMessage);
      return;
    }
    setOutside(false);
    report(null);
    if (Math.abs(result.value - value) > 1e-9) emit(result.value);
    if (final) setDraft(null);
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') {
      check(e.currentTarget.value, true);
    } else if (e.key === 'Escape') {
      setDraft(null);
      setUnread(false);
      setOutside(false);
      report(null);
    } else if (e.key === 'ArrowUp' || e.key === 'ArrowDown') {
      e.preventDefault();
      const next = value + (e.key === 'ArrowUp' ? step : -step);
      if (next < min || next > max) {
        report(rangeMessage);
        return;
      }
      setDraft(null);
      setUnread(false);
      setOutside(false);
      report(null);
      emit(next);
    }
  };

  const shown = draft ?? String(toDisplay(value));
  return (
    <Input
      role="spinbutton"
      aria-label={label}
      aria-valuemin={toDisplay(min)}
      aria-valuemax={toDisplay(max)}
      aria-valuenow={toDisplay(value)}
      aria-invalid={unread || outside || invalid || undefined}
      inputMode="text"
      autoComplete="off"
      value={shown}
      suffix={suffix}
      status={unread || outside || invalid ? 'error' : undefined}
      style={style}
      onChange={(e) => {
        setDraft(e.target.value);
        check(e.target.value, false);
      }}
      onBlur={(e) => {
        if (draft !== null) check(e.target.value, true);
      }}
      onKeyDown={onKeyDown}
    />
  );
}
