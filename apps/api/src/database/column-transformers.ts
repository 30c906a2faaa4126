import type { ValueTransformer } from 'typeorm';

/** PostgreSQL `numeric` arrives as a string (to keep precision); our values fit a JS number. */
export const numericColumn: ValueTransformer = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};
