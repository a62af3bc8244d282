import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { MM_PER_FOOT, MM_PER_INCH, formatInches, formatLength, formatMm, parseLength } from '../../../shared/units/index.js';
import { num, referenceCase } from '../acoustics/reference-cases.js';

const mm = (text: string, unit: 'mm' | 'in' = 'mm') => {
  const r = parseLength(text, unit);
  if (!r.ok) throw new Error(r.message);
  return r.mm;
};

describe('unit constants (International Yard and Pound Agreement 1959, REFERENCES §8)', () => {
  it('1 in = 25.4 mm and 1 ft = 304.8 mm exactly', () => {
    expect(MM_PER_INCH).toBe(num(referenceCase('inch-mm').expected));
    expect(MM_PER_FOOT).toBe(num(referenceCase('foot-mm').expected));
  });
  it('a 48 × 96 in sheet is 1219.2 × 2438.4 mm (exact conversion)', () => {
    expect(mm('48 in')).toBeCloseTo(1219.2, 9);
    expect(mm("8'")).toBeCloseTo(2438.4, 9);
  });
});

describe('parsing what people type', () => {
  it.each([
    ['12 3/8"', 314.325],
    ['12-3/8 in', 314.325],
    ['12.375 in', 314.325],
    ['12.375in', 314.325],
    ['12.375 inches', 314.325],
    ['3/8"', 9.525],
    ['314.5 mm', 314.5],
    ['314.5', 314.5],
    ['31.45 cm', 314.5],
    ['0.3145 m', 314.5],
    ['314,5 mm', 314.5],
    ["1' 2 3/8\"", 365.125],
    ['2 ft', 609.6],
    ['  7 MM ', 7],
  ])('%s → %f mm', (text, expected) => {
    expect(mm(text)).toBeCloseTo(expected, 9);
  });

  it('a bare number takes the default unit', () => {
    expect(mm('314.5', 'mm')).toBe(314.5);
    expect(mm('12.375', 'in')).toBeCloseTo(314.325, 9);
    expect(mm('12 3/8', 'in')).toBeCloseTo(314.325, 9);
  });

  it.each(['', 'abc', '12..5', '5 kg', '12 9/8"', '1/0"', '3.5 1/2"', '12 3/8 mm extra', "1' 2 mm"])('junk %j gets a clear error', (text) => {
    const r = parseLength(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/length/);
  });
});

describe('formatting', () => {
  it('inches with fractions of 1/16 or 1/32, reduced', () => {
    expect(formatInches(314.325)).toBe('12 3/8"');
    expect(formatInches(25.4)).toBe('1"');
    expect(formatInches(3.175)).toBe('1/8"');
    expect(formatInches(25.4 * 1.02)).toBe('1"'); // 1.02 in → nearest 1/16 is 1 in
    expect(formatInches(25.4 * 1.05)).toBe('1 1/16"');
    expect(formatInches(25.4 + 25.4 / 32, { style: 32 })).toBe('1 1/32"');
    expect(formatInches(-12.7)).toBe('-1/2"');
    expect(formatInches(18)).toBe('11/16"'); // 18 mm = 0.7087 in ≈ 11/16
  });
  it('inches as decimals, mm with one decimal', () => {
    expect(formatInches(314.325, { style: 'decimal' })).toBe('12.375"');
    expect(formatInches(1000, { style: 'decimal', decimals: 2 })).toBe('39.37"');
    expect(formatMm(314.5)).toBe('314.5 mm');
    expect(formatMm(314)).toBe('314 mm');
    expect(formatLength(25.4, 'in')).toBe('1"');
    expect(formatLength(25.4, 'mm')).toBe('25.4 mm');
  });
  it('round trip: formatted to 1/32 in and parsed back is within 1/64 in (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5000, noNaN: true }), (x) => {
        const back = mm(formatInches(x, { style: 32 }));
        expect(Math.abs(back - x)).toBeLessThanOrEqual(25.4 / 64 + 1e-9);
      }),
    );
  });
});
