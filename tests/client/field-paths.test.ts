/**
 * API field paths (`braces[1].position`, shared/errors.ts) ↔ react-hook-form paths (`braces.1.position`).
 * Outside references: zod produces the issue paths, shared/errors.ts formats them the way the server
 * does, and react-hook-form's own `get` (its documented dot-path lookup) must find the same value the
 * path names in the design object.
 */
import fc from 'fast-check';
import { get } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import { formatFieldPath, issuesToFields } from '../../shared/errors';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs';
import { designSchema } from '../../shared/schemas/design.schema';
import { describeFormPath, fieldMessages, toApiPath, toFormPath } from '../../src/lib/field-paths';

describe('toFormPath', () => {
  it('turns array indices into dot segments', () => {
    expect(toFormPath('braces[1].position')).toBe('braces.1.position');
    expect(toFormPath('braces[0].windows[2].u')).toBe('braces.0.windows.2.u');
    expect(toFormPath('braces[3].at[0]')).toBe('braces.3.at.0');
    expect(toFormPath('outer.width')).toBe('outer.width');
  });

  it('drops the `design.` wrapper of a PUT body {version, design}', () => {
    expect(toFormPath('design.openings[2].x', 'design')).toBe('openings.2.x');
    expect(toFormPath('design', 'design')).toBe('');
    // A field that merely starts with the same letters is not the wrapper.
    expect(toFormPath('designer.name', 'design')).toBe('designer.name');
  });

  it("maps the whole-body marker '(root)' to the form's root", () => {
    expect(toFormPath('(root)')).toBe('');
  });

  it('names the same value in the design as zod and react-hook-form do', () => {
    const bad = structuredClone(DEMO_BOOKSHELF) as Record<string, unknown> & { braces: Array<Record<string, unknown>>; openings: Array<Record<string, unknown>> };
    bad.braces[0]!.thickness = -5;
    bad.openings[1]!.diameter = 'wide';
    const result = designSchema.safeParse(bad);
    expect(result.success).toBe(false);
    if (result.success) return;
    const fields = issuesToFields(result.error.issues);
    expect(Object.keys(fields)).toEqual(expect.arrayContaining(['braces[0].thickness', 'openings[1].diameter']));
    for (const issue of result.error.issues) {
      const formPath = toFormPath(formatFieldPath(issue.path));
      let expected: unknown = bad;
      for (const key of issue.path) expected = (expected as Record<PropertyKey, unknown>)[key as string];
      expect(get(bad, formPath)).toBe(expected);
    }
  });

  it('round-trips any path of names and indices (property test)', () => {
    const segment = fc.oneof(fc.stringMatching(/^[a-zA-Z][a-zA-Z0-9]{0,8}$/), fc.nat(50));
    fc.assert(
      fc.property(fc.stringMatching(/^[a-zA-Z][a-zA-Z0-9]{0,8}$/), fc.array(segment, { maxLength: 5 }), (first, rest) => {
        const apiPath = formatFieldPath([first, ...rest]);
        expect(toApiPath(toFormPath(apiPath))).toBe(apiPath);
      }),
    );
  });
});

describe('fieldMessages and describeFormPath', () => {
  it('keeps the server order and gives readable labels', () => {
    const messages = fieldMessages({ 'design.braces[1].position': 'outside the cavity', 'design.outer.width': 'too small' }, 'design');
    expect(messages).toEqual([
      { formPath: 'braces.1.position', message: 'outside the cavity' },
      { formPath: 'outer.width', message: 'too small' },
    ]);
    expect(describeFormPath('braces.1.position')).toBe('Brace 2 › position');
    expect(describeFormPath('braces.0.windows.2.u')).toBe('Brace 1 › window 3 › u');
    expect(describeFormPath('openings.0.x')).toBe('Opening 1 › x');
    expect(describeFormPath('')).toBe('Design');
  });
});
