/**
 * Lengths shown and typed in the studio: millimetres inside, shown in mm or in inches with fractions of
 * 1/16 (shared/units). Inputs accept either unit whatever is shown; a bare number is in the shown unit.
 */
import { formatLength as formatShared, parseLength as parseShared, type ParseResult } from '../../../../shared/units/index';
import type { UnitSystem } from './types';

export type { ParseResult };

/** `314.3 mm` or `12 3/8"`; `{unit: false}` leaves the unit off (for `W × H mm` pairs). */
export function formatLength(mm: number, units: UnitSystem, opts: { unit?: boolean } = {}): string {
  const text = formatShared(mm, units);
  if (opts.unit ?? true) return text;
  return units === 'in' ? text.replace(/"$/, '') : text.replace(/ mm$/, '');
}

export function parseLength(text: string, units: UnitSystem): ParseResult {
  return parseShared(text, units);
}
