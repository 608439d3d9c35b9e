import { ValueTransformer } from 'typeorm';

/** mysql2 returns DECIMAL as a string; the API speaks numbers. */
export const decimalTransformer: ValueTransformer = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null || value === undefined ? null : Number(value)),
};
