/**
 * Lengths shown in the studio's drawings and read-outs: millimetres inside, shown in mm or in inches with
 * fractions of 1/16 (shared/units), as a workshop drawing rounds them. Input boxes show exact values and
 * accept either unit (src/lib/length-text.ts).
 */
import { formatLength as formatShared } from '../../../../shared/units/index';
import type { UnitSystem } from './types';

/** `314.3 mm` or `12 3/8"`; `{unit: false}` leaves the unit off (for `W × H mm` pairs). */
export function formatLength(mm: number, units: UnitSystem, opts: { unit?: boolean } = {}): string {
  const text = formatShared(mm, units);
  if (opts.unit ?? true) return text;
  return units === 'in' ? text.replace(/"$/, '') : text.replace(/ mm$/, '');
}
