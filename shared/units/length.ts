/**
 * Lengths are stored in millimetres; inches are shown on request. 1 in = 25.4 mm exactly and
 * 1 ft = 304.8 mm (International Yard and Pound Agreement, 1959; REFERENCES.md §8).
 */

export const MM_PER_INCH = 25.4;
export const MM_PER_FOOT = 304.8;

export type LengthUnit = 'mm' | 'in';

export interface InchFormat {
  /** Fractions of 1/16 or 1/32 in, or decimals. Default 16. */
  style?: 16 | 32 | 'decimal';
  /** Decimal places for the decimal style (default 3). */
  decimals?: number;
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/**
 * Formats millimetres as inches: `12 3/8"` (rounded to the nearest 1/16 or 1/32, reduced) or `12.375"`.
 */
export function formatInches(mm: number, opts: InchFormat = {}): string {
  const style = opts.style ?? 16;
  const inches = mm / MM_PER_INCH;
  const sign = inches < 0 ? '-' : '';
  const abs = Math.abs(inches);
  if (style === 'decimal') {
    const d = opts.decimals ?? 3;
    const text = abs.toFixed(d).replace(/\.?0+$/, '');
    return `${text === '0' ? '' : sign}${text}"`;
  }
  const ticks = Math.round(abs * style);
  if (ticks === 0) return '0"';
  const whole = Math.floor(ticks / style);
  let num = ticks % style;
  let den: number = style;
  if (num === 0) return `${sign}${whole}"`;
  const g = gcd(num, den);
  num /= g;
  den /= g;
  return whole === 0 ? `${sign}${num}/${den}"` : `${sign}${whole} ${num}/${den}"`;
}

/** Formats millimetres as `314.5 mm` (up to `decimals` places, trailing zeros dropped; default 1). */
export function formatMm(mm: number, decimals = 1): string {
  const text = mm.toFixed(decimals).replace(/\.?0+$/, '');
  return `${text === '-0' ? '0' : text} mm`;
}

/** Formats a length in the user's unit. */
export function formatLength(mm: number, unit: LengthUnit, opts: InchFormat & { mmDecimals?: number } = {}): string {
  return unit === 'in' ? formatInches(mm, opts) : formatMm(mm, opts.mmDecimals ?? 1);
}

export type ParseResult = { ok: true; mm: number } | { ok: false; message: string };

const UNIT_MM: Record<string, number> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_INCH,
  inch: MM_PER_INCH,
  inches: MM_PER_INCH,
  '"': MM_PER_INCH,
  '″': MM_PER_INCH,
  '”': MM_PER_INCH,
  ft: MM_PER_FOOT,
  foot: MM_PER_FOOT,
  feet: MM_PER_FOOT,
  "'": MM_PER_FOOT,
  '′': MM_PER_FOOT,
  '’': MM_PER_FOOT,
};

// A number: decimal (comma or point), a whole number with a fraction (`12 3/8`, `12-3/8`) or a bare fraction (`3/8`).
const NUMBER = String.raw`(?<fnum>\d+)\s*/\s*(?<fden>\d+)|(?<whole>\d+(?:[.,]\d+)?|[.,]\d+)(?:(?:\s+|\s*-\s*)(?<num>\d+)\s*/\s*(?<den>\d+))?`;
const UNIT = String.raw`mm|cm|m|inches|inch|in|feet|foot|ft|"|″|”|'|′|’`;
const QUANTITY = new RegExp(String.raw`^(?:${NUMBER})\s*(?<unit>${UNIT})?`, 'i');

function readQuantity(text: string): { value: number; unit?: string; rest: string } | { error: string } | null {
  const m = QUANTITY.exec(text);
  const g = m?.groups;
  if (!m || !g) return null;
  let value: number;
  if (g.whole !== undefined) {
    value = Number(g.whole.replace(',', '.'));
    if (g.num !== undefined && g.den !== undefined) {
      const num = Number(g.num);
      const den = Number(g.den);
      if (den === 0) return { error: 'a fraction cannot have 0 below the line' };
      if (num >= den) return { error: `${num}/${den} is not a proper fraction` };
      if (/[.,]/.test(g.whole)) return { error: 'write either decimals or a fraction, not both' };
      value += num / den;
    }
  } else {
    const num = Number(g.fnum);
    const den = Number(g.fden);
    if (den === 0) return { error: 'a fraction cannot have 0 below the line' };
    value = num / den;
  }
  return { value, unit: g.unit?.toLowerCase(), rest: text.slice(m[0].length).trim() };
}

/**
 * Parses what a person types as a length: `12 3/8"`, `12-3/8 in`, `12.375 in`, `314.5 mm`, `31.45 cm`,
 * `1' 2 3/8"`, or a bare number `314.5` in `defaultUnit`. A comma works as the decimal mark. Returns
 * millimetres, or a clear message for anything else.
 */
export function parseLength(input: string, defaultUnit: LengthUnit = 'mm'): ParseResult {
  const original = input;
  let text = input.trim();
  const bad = (why?: string): ParseResult => ({
    ok: false,
    message: `"${original.trim()}" is not a length${why ? ` (${why})` : ''}: write for example 314.5 mm, 12.375 in or 12 3/8"`,
  });
  if (text === '') return { ok: false, message: 'a length is required: write for example 314.5 mm, 12.375 in or 12 3/8"' };
  let sign = 1;
  if (text.startsWith('-')) {
    sign = -1;
    text = text.slice(1).trim();
  } else if (text.startsWith('+')) text = text.slice(1).trim();
  const first = readQuantity(text);
  if (first === null) return bad();
  if ('error' in first) return bad(first.error);
  let mm: number;
  if (first.unit !== undefined && UNIT_MM[first.unit] === MM_PER_FOOT) {
    mm = first.value * MM_PER_FOOT;
    if (first.rest !== '') {
      const second = readQuantity(first.rest);
      if (second === null) return bad();
      if ('error' in second) return bad(second.error);
      if (second.rest !== '') return bad();
      if (second.unit !== undefined && UNIT_MM[second.unit] !== MM_PER_INCH) return bad('after feet come inches');
      mm += second.value * MM_PER_INCH;
    }
  } else {
    if (first.rest !== '') return bad();
    const factor = first.unit !== undefined ? UNIT_MM[first.unit]! : defaultUnit === 'in' ? MM_PER_INCH : 1;
    mm = first.value * factor;
  }
  if (!Number.isFinite(mm)) return bad();
  return { ok: true, mm: sign * mm };
}
