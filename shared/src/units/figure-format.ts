import { formatLength } from './length';

/** `1270.0 mm (50 in)`: millimetres with inches to 1/16 for people working in either. */
export function mmWithInches(mm: number): string {
  return `${formatLength(mm, { unit: 'mm' })} (${formatLength(mm, { unit: 'in', style: 'fraction' })})`;
}

export function formatDegrees(value: number, decimals = 2): string {
  return `${value.toFixed(decimals)}°`;
}
