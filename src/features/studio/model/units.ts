/**
 * Lengths shown and typed in the studio: millimetres inside, shown in mm or inches with fractions.
 * Interim local version until shared/units lands; then this delegates to it.
 */
import { MM_PER_INCH } from './snapping';
import type { UnitSystem } from './types';

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** 314.325 → `12 3/8 in`; 0.1 mm precision in mm (`314.3 mm`). */
export function formatLength(mm: number, units: UnitSystem, opts: { unit?: boolean } = {}): string {
  const withUnit = opts.unit ?? true;
  if (units === 'mm') {
    const v = Math.round(mm * 10) / 10;
    return `${Number.isInteger(v) ? v : v.toFixed(1)}${withUnit ? ' mm' : ''}`;
  }
  const sign = mm < 0 ? '-' : '';
  const sixteenths = Math.round((Math.abs(mm) / MM_PER_INCH) * 16);
  const whole = Math.floor(sixteenths / 16);
  const rest = sixteenths % 16;
  let text = String(whole);
  if (rest !== 0) {
    const g = gcd(rest, 16);
    text = whole === 0 ? `${rest / g}/${16 / g}` : `${whole} ${rest / g}/${16 / g}`;
  }
  return `${sign}${text}${withUnit ? ' in' : ''}`;
}

export type ParseResult = { ok: true; mm: number } | { ok: false; message: string };

/** Accepts `314.5`, `314.5 mm`, `12.375 in`, `12 3/8"`, `3/8 in`; a bare number is in `units`. */
export function parseLength(text: string, units: UnitSystem): ParseResult {
  const t = text.trim().toLowerCase().replace(/,/g, '.');
  const m = /^(-?\d+(?:\.\d+)?)?(?:\s*(?:(\d+)\s*\/\s*(\d+)))?\s*(mm|in|inch|inches|"|″|cm)?$/.exec(t);
  if (!t || !m || (m[1] === undefined && m[2] === undefined)) {
    return { ok: false, message: 'enter a length such as 314.5 mm or 12 3/8 in' };
  }
  const unit = m[4] ?? (units === 'in' ? 'in' : 'mm');
  let value = m[1] !== undefined ? Number(m[1]) : 0;
  if (m[2] !== undefined) {
    const den = Number(m[3]);
    if (den === 0) return { ok: false, message: 'a fraction cannot divide by 0' };
    const frac = Number(m[2]) / den;
    if (m[1] !== undefined && m[1].includes('.')) return { ok: false, message: 'write either a decimal or a fraction' };
    value = value < 0 ? value - frac : value + frac;
  }
  const mm = unit === 'mm' ? value : unit === 'cm' ? value * 10 : value * MM_PER_INCH;
  return { ok: true, mm };
}
