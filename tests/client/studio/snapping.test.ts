import { describe, expect, it } from 'vitest';
import { MM_PER_INCH, nudgeStepMm, snapCoordinate, snapToGrid } from '../../../src/features/studio/model/snapping';

describe('snapping', () => {
  it('1 in is 25.4 mm exactly (International Yard and Pound Agreement, 1959; REFERENCES.md §8)', () => {
    expect(MM_PER_INCH).toBe(25.4);
  });

  it.each([
    ['mm1', 123.4, 123],
    ['mm1', 123.5, 124],
    ['mm5', 212.4, 210],
    ['mm5', 212.6, 215],
    ['mm10', 214.9, 210],
    ['mm10', 215.1, 220],
    ['off', 215.123, 215.123],
  ] as const)('grid %s snaps %f mm to %f mm', (grid, value, expected) => {
    expect(snapToGrid(value, grid)).toBeCloseTo(expected, 9);
  });

  it('snaps to sixteenths of an inch: 1/16 in = 1.5875 mm (25.4 / 16, derived)', () => {
    expect(snapToGrid(1.6, 'in16')).toBeCloseTo(1.5875, 9);
    // 12 3/8 in = 314.325 mm (derived from 25.4 mm/in); 314.5 mm is nearer to it than to 12 7/16 in (315.9125 mm).
    expect(snapToGrid(314.5, 'in16')).toBeCloseTo(314.325, 9);
    expect(snapToGrid(315.2, 'in16')).toBeCloseTo(315.9125, 9);
    // Every snapped value is a whole number of sixteenths.
    for (const v of [0.3, 7.9, 99.99, 480.2]) {
      const sixteenths = (snapToGrid(v, 'in16') / 25.4) * 16;
      expect(Math.abs(sixteenths - Math.round(sixteenths))).toBeLessThan(1e-9);
    }
  });

  it('a centre line within the tolerance wins over the grid, and the nearest one is taken', () => {
    expect(snapCoordinate(108.6, 'mm10', [110, 100], 3)).toEqual({ valueMm: 110, guideMm: 110 });
    expect(snapCoordinate(104.0, 'mm10', [110, 100], 3)).toEqual({ valueMm: 100, guideMm: null });
    expect(snapCoordinate(101.2, 'mm1', [100, 103], 5)).toEqual({ valueMm: 100, guideMm: 100 });
  });

  it('a nudge is one grid step, ten with Shift; 1 mm without a grid', () => {
    expect(nudgeStepMm('mm5', false)).toBe(5);
    expect(nudgeStepMm('mm5', true)).toBe(50);
    expect(nudgeStepMm('off', false)).toBe(1);
    expect(nudgeStepMm('in16', false)).toBeCloseTo(1.5875, 9);
  });
});
