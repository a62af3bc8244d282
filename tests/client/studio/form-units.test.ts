/**
 * Lengths in the design form and the studio's inspector (src/lib/length-text.ts): shown in the user's unit, typed in
 * either, never shown rounded to a value that would change the design. 1 in = 25.4 mm exactly (International Yard
 * and Pound Agreement, 1959; REFERENCES.md §8).
 */
import { describe, expect, it } from 'vitest';
import { formatLengthInput, parseLengthInput } from '../../../src/lib/length-text';

describe('the form shows lengths in the chosen unit', () => {
  it.each([
    [215, 'mm', '215'],
    [314.5, 'mm', '314.5'],
    [314.325, 'mm', '314.325'],
    [0, 'mm', '0'],
    // 12 3/8 in = 12.375 × 25.4 = 314.325 mm
    [314.325, 'in', '12 3/8'],
    // 3/4 in = 19.05 mm; 1/32 in = 0.79375 mm
    [19.05, 'in', '3/4'],
    [0.79375, 'in', '1/32'],
    // 220 mm = 8.66142 in: not a whole number of 1/32 in, so decimals (8 11/16 in would be 220.66 mm)
    [220, 'in', '8.661'],
    [254, 'in', '10'],
  ] as const)('%f mm in %s shows "%s"', (mm, unit, text) => {
    expect(formatLengthInput(mm, unit)).toBe(text);
  });

  it('can show the unit, as the inspector does', () => {
    expect(formatLengthInput(215, 'mm', { unit: true })).toBe('215 mm');
    expect(formatLengthInput(314.325, 'in', { unit: true })).toBe('12 3/8"');
  });

  it('a length the studio kept to 0.1 µm (a sixteenth of an inch: 1.5875 mm) still shows as a fraction', () => {
    expect(formatLengthInput(Math.round(((7 * 25.4) / 16) * 10000) / 10000, 'in')).toBe('7/16');
  });
});

describe('the form accepts either unit, whatever is shown', () => {
  it.each([
    ['12 3/8"', 'mm', 314.325],
    ['12.375 in', 'mm', 314.325],
    ['314.5 mm', 'in', 314.5],
    ['314.5', 'mm', 314.5],
    ['12 3/8', 'in', 314.325],
    ['31.45 cm', 'in', 314.5],
    ['1\' 2 3/8"', 'mm', 304.8 + 2.375 * 25.4],
  ] as const)('"%s" with %s shown is %f mm', (text, unit, mm) => {
    const r = parseLengthInput(text, unit);
    expect(r.ok && r.mm).toBeCloseTo(mm, 9);
  });

  it('an empty box is no value (the schema says whether one is required)', () => {
    expect(parseLengthInput('  ', 'in')).toEqual({ ok: true, mm: undefined });
  });

  it('text that is not a length gets a message saying what to write', () => {
    const r = parseLengthInput('twelve', 'in');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/not a length.*314\.5 mm/);
  });

  it('what the form shows reads back as the same length, in both units', () => {
    for (const mm of [18, 215, 314.325, 19.05, 1.5875, 1000]) {
      for (const unit of ['mm', 'in'] as const) {
        const back = parseLengthInput(formatLengthInput(mm, unit), unit);
        // Decimals of an inch are shown to 0.001 in = 0.0254 mm; fractions and mm exactly.
        expect(back.ok && Math.abs(back.mm! - mm)).toBeLessThanOrEqual(unit === 'in' ? 0.0254 / 2 : 1e-9);
      }
    }
  });
});
