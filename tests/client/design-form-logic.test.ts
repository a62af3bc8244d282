/**
 * Pure logic behind the design form: defaults for new items, coordinates per face, number parsing,
 * dirty comparison, safe redirects and display formatting.
 * References: PRODUCT.md §3 (coordinates used per face) and §8 (window u, v are the two spanned axes in
 * alphabetical order: across y → u = x, v = z); ECMA-402 Intl.RelativeTimeFormat for relative times.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs';
import { designSchema, FACE_COORDS, FACES } from '../../shared/schemas/design.schema';
import { safeRedirect } from '../../src/config/paths';
import { canonicalJson, sameDesign } from '../../src/features/designs/compare';
import { faceCentre, keepFaceCoords, newBrace, newDesign, newOpening, newWindow, otherAxes } from '../../src/features/designs/defaults';
import { formatRelativeTime, formatSizeMm } from '../../src/lib/format';
import { parseNumberField } from '../../src/lib/number-input';

const outer = { width: 220, height: 360, depth: 260 };

describe('new items start valid and in the middle of their face', () => {
  it('a new design passes the shared schema', () => {
    expect(designSchema.safeParse(newDesign('Study monitor', outer)).success).toBe(true);
  });

  it.each(['driver', 'port', 'terminal', 'lead'] as const)('a new %s passes the schema and sits at its face centre', (type) => {
    const opening = newOpening(type, outer);
    const design = { ...newDesign('t', outer), openings: [opening] };
    expect(designSchema.safeParse(design).success).toBe(true);
    const [a, b] = FACE_COORDS[opening.face];
    const half = { x: outer.width / 2, y: outer.height / 2, z: outer.depth / 2 };
    expect(opening[a]).toBe(half[a]);
    expect(opening[b]).toBe(half[b]);
  });

  it.each(['shelf', 'bar'] as const)('a new %s brace passes the schema', (type) => {
    const design = { ...newDesign('t', outer), braces: [newBrace(type, outer, 18)] };
    expect(designSchema.safeParse(design).success).toBe(true);
  });

  it('windows use the two spanned axes in alphabetical order (PRODUCT.md §8)', () => {
    expect(otherAxes('y')).toEqual(['x', 'z']);
    expect(otherAxes('x')).toEqual(['y', 'z']);
    expect(otherAxes('z')).toEqual(['x', 'y']);
    // Across y the window centre is (u = x, v = z): the middle of width and depth.
    expect(newWindow('round', 'y', outer)).toMatchObject({ u: 110, v: 130 });
    expect(newWindow('rect', 'z', outer)).toMatchObject({ u: 110, v: 180 });
  });
});

describe('coordinates per face (PRODUCT.md §3)', () => {
  it('faceCentre gives exactly the two coordinates of the face', () => {
    for (const face of FACES) {
      expect(Object.keys(faceCentre(face, outer)).sort()).toEqual([...FACE_COORDS[face]].sort());
    }
  });

  it('keepFaceCoords drops the third coordinate and keeps the rest', () => {
    const moved = { type: 'lead' as const, face: 'left' as const, x: 110, y: 200, z: 90, diameter: 10 };
    expect(keepFaceCoords(moved)).toEqual({ type: 'lead', face: 'left', y: 200, z: 90, diameter: 10 });
    expect(moved.x).toBe(110); // the input is not changed
  });
});

describe('number inputs', () => {
  it('reads typed text as a number, an empty box as undefined', () => {
    expect(parseNumberField('240')).toBe(240);
    expect(parseNumberField(' 12.5 ')).toBe(12.5);
    expect(parseNumberField('12,5')).toBe(12.5); // a decimal comma, as typed in much of Europe
    expect(parseNumberField('')).toBeUndefined();
    expect(parseNumberField('abc')).toBeUndefined();
    expect(parseNumberField(18)).toBe(18);
    expect(parseNumberField(Number.NaN)).toBeUndefined();
  });
});

describe('dirty comparison', () => {
  it('ignores key order and keys holding undefined, but sees any real change', () => {
    const saved = designSchema.parse(DEMO_BOOKSHELF);
    const reordered = Object.fromEntries(Object.entries(saved).reverse());
    expect(sameDesign(saved, reordered)).toBe(true);
    const withEmptyOptional = { ...saved, baffleThickness: saved.baffleThickness, material: { ...saved.material, density: saved.material.density, grade: undefined } };
    expect(sameDesign(saved, withEmptyOptional)).toBe(true);
    expect(sameDesign(saved, { ...saved, outer: { ...saved.outer, width: 221 } })).toBe(false);
    expect(sameDesign(saved, { ...saved, braces: [] })).toBe(false);
    expect(canonicalJson({ b: 1, a: [{ d: 2, c: undefined }] })).toBe('{"a":[{"d":2}],"b":1}');
  });
});

describe('redirect after sign-in', () => {
  it('accepts same-site paths only', () => {
    expect(safeRedirect('/w/1/designs/4?x=1')).toBe('/w/1/designs/4?x=1');
    expect(safeRedirect('//evil.example/')).toBe('/');
    expect(safeRedirect('/\\evil.example')).toBe('/');
    expect(safeRedirect('https://evil.example/')).toBe('/');
    expect(safeRedirect('/sign-in?redirectTo=/x')).toBe('/');
    expect(safeRedirect(null)).toBe('/');
  });
});

describe('formatting', () => {
  const now = new Date('2026-12-01T12:00:00Z');
  it('writes relative times as Intl.RelativeTimeFormat (ECMA-402) does', () => {
    const rtf = new Intl.RelativeTimeFormat('en-GB', { numeric: 'auto' });
    expect(formatRelativeTime('2026-12-01T11:59:50Z', now)).toBe('just now');
    expect(formatRelativeTime('2026-12-01T11:55:00Z', now)).toBe(rtf.format(-5, 'minute'));
    expect(formatRelativeTime('2026-12-01T09:00:00Z', now)).toBe(rtf.format(-3, 'hour'));
    expect(formatRelativeTime('2026-11-30T12:00:00Z', now)).toBe(rtf.format(-1, 'day')); // "yesterday"
    expect(formatRelativeTime('not a date', now)).toBe('—');
  });

  it('writes sizes W × H × D in mm without thousands separators', () => {
    expect(formatSizeMm(200, 1000, 300)).toBe('200 × 1000 × 300 mm');
    expect(formatSizeMm(220.25, 360, 260)).toBe('220.3 × 360 × 260 mm');
  });
});
