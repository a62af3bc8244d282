/**
 * The New design dialog's lengths: typed in the user's unit (or the other), stored in millimetres, with messages that
 * name the field as the design form's do. 1 in = 25.4 mm exactly (NIST SP 811, 2008 edition, Appendix B: inch =
 * 2.54 × 10⁻² m exactly; the International Yard and Pound Agreement of 1959, REFERENCES.md §8).
 */
import { describe, expect, it } from 'vitest';
import { designSchema } from '../../shared/schemas/design.schema';
import { fieldNameOf } from '../../src/features/designs/components/fields';
import { newDesign, startingOuter } from '../../src/features/designs/defaults';
import { formatLengthInput, parseLengthField } from '../../src/lib/length-text';

describe('the starting size', () => {
  it('is round in millimetres for a metric user', () => {
    expect(startingOuter('mm')).toEqual({ width: 250, height: 400, depth: 300 });
  });

  it('is round in inches for an inch user: 10 × 16 × 12 in = 254 × 406.4 × 304.8 mm (NIST SP 811: 1 in = 25.4 mm)', () => {
    const outer = startingOuter('in');
    expect(outer.width).toBeCloseTo(254, 9);
    expect(outer.height).toBeCloseTo(406.4, 9);
    expect(outer.depth).toBeCloseTo(304.8, 9);
    expect([outer.width, outer.height, outer.depth].map((mm) => formatLengthInput(mm, 'in'))).toEqual(['10', '16', '12']);
  });

  it('makes a design the shared schema accepts, in both units', () => {
    for (const unit of ['mm', 'in'] as const) {
      expect(designSchema.safeParse(newDesign('Starting size', startingOuter(unit))).success).toBe(true);
    }
  });
});

describe('a size typed in the dialog', () => {
  it.each([
    // 12 3/8 in × 25.4 mm/in = 314.325 mm; 15.5 in = 393.7 mm; 11 in = 279.4 mm (NIST SP 811: 1 in = 25.4 mm exactly)
    ['12 3/8', 314.325],
    ['15.5 in', 393.7],
    ['11"', 279.4],
    // Millimetres typed while inches are shown stay millimetres.
    ['300 mm', 300],
  ] as const)('"%s" with inches shown is %f mm', (text, mm) => {
    const r = parseLengthField(text, 'in', 'width');
    expect(r.ok && r.mm).toBeCloseTo(mm, 9);
  });

  it('that is not a length gets a message naming the field and saying what to write', () => {
    const r = parseLengthField('twelve', 'in', 'height');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/^height: "twelve" is not a length.*314\.5 mm/);
  });

  it('names the field as the schema does: the label without its letter, in lower case', () => {
    expect(fieldNameOf('Width (W)', 'outer.width')).toBe('width');
    expect(fieldNameOf('Panel thickness', 'material.thickness')).toBe('panel thickness');
    // The schema's own message for the same field, for comparison (shared/schemas/design.schema.ts).
    const bad = designSchema.pick({ outer: true }).safeParse({ outer: { width: 0, height: 1, depth: 1 } });
    expect(bad.success ? '' : bad.error.issues[0]!.message).toBe('width must be greater than 0');
  });
});
