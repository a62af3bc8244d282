/**
 * Lengths in input boxes: millimetres inside, shown in the user's unit (mm, or inches) and typed in either
 * (parsing is shared/units' parseLength: `12 3/8"`, `12.375 in`, `314.5 mm`, a bare number in the shown
 * unit). An input never shows a rounded value that would change the design if committed as shown:
 * millimetres to 0.1 µm (as lengths are kept); inches as a fraction only when the length is a whole number of
 * 1/32 in, otherwise as decimals to 0.001 in (and a box whose text is not changed is never committed).
 * Used by the design form and the studio's inspector.
 */
import { formatInches, MM_PER_INCH, parseLength, type LengthUnit, type ParseResult } from '../../shared/units/index';

/** Lengths are kept to 0.1 µm (the studio rounds to that), so "a whole number of 1/32 in" allows that much. */
const FRACTION_TOLERANCE_MM = 0.0005;

/**
 * `314.325` mm → `314.325` (mm) or `12 3/8` (in); `1.5875` → `1.5875` (mm) or `1/16` (in); `220` → `8.661` (in). With `unit: true`: `314.325 mm`,
 * `12 3/8"`.
 */
export function formatLengthInput(mm: number, unit: LengthUnit, opts: { unit?: boolean } = {}): string {
  const withUnit = opts.unit ?? false;
  if (unit === 'mm') {
    const text = mm.toFixed(4).replace(/\.?0+$/, '');
    const clean = text === '-0' ? '0' : text;
    return withUnit ? `${clean} mm` : clean;
  }
  const thirtySeconds = (mm / MM_PER_INCH) * 32;
  const exact = Math.abs(Math.round(thirtySeconds) - thirtySeconds) * (MM_PER_INCH / 32) < FRACTION_TOLERANCE_MM;
  const text = exact ? formatInches(mm, { style: 32 }) : formatInches(mm, { style: 'decimal', decimals: 3 });
  return withUnit ? text : text.replace(/"$/, '');
}

export type LengthTextResult = { ok: true; mm: number | undefined } | { ok: false; message: string };

/**
 * What a person typed into a length box: an empty box is `undefined` (the schema then says whether the
 * value is required), anything else a length in either unit, kept to 0.1 µm.
 */
export function parseLengthInput(text: string, unit: LengthUnit): LengthTextResult {
  if (text.trim() === '') return { ok: true, mm: undefined };
  const r: ParseResult = parseLength(text, unit);
  if (!r.ok) return r;
  return { ok: true, mm: Math.round(r.mm * 10000) / 10000 };
}

/**
 * `parseLengthInput` for a named box: a failure names the field the way the schema's messages do
 * (`width: "twelve" is not a length: write for example …`). Used by the design form and the New design dialog.
 */
export function parseLengthField(text: string, unit: LengthUnit, fieldName: string): LengthTextResult {
  const r = parseLengthInput(text, unit);
  return r.ok ? r : { ok: false, message: `${fieldName}: ${r.message}` };
}
