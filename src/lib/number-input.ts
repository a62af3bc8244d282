import type { FieldValues, Path, UseFormRegister } from 'react-hook-form';

/**
 * Registers a number field: an empty box becomes `undefined` (so the schema can say "is required" or
 * leave an optional value out), anything else `Number(text)`; the browser's number keyboard and steps.
 */
export function numberInput<T extends FieldValues>(register: UseFormRegister<T>, name: Path<T>, step: number | 'any' = 'any') {
  return {
    type: 'number' as const,
    inputMode: 'decimal' as const,
    step,
    ...register(name, { setValueAs: parseNumberField }),
  };
}

export function parseNumberField(value: unknown): number | undefined {
  if (typeof value === 'number') return Number.isNaN(value) ? undefined : value;
  if (typeof value !== 'string') return undefined;
  const text = value.trim().replace(',', '.');
  if (text === '') return undefined;
  const n = Number(text);
  return Number.isNaN(n) ? undefined : n;
}
