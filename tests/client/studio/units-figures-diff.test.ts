import { describe, expect, it } from 'vitest';
import { planDesign } from '../../../shared/cabinet/index';
import { diffDesigns } from '../../../src/features/studio/model/diff';
import { EMPTY_FIGURES, nextFigures, type PlanOutcome } from '../../../src/features/studio/model/figures';
import { formatLength } from '../../../src/features/studio/model/units';
import { StudioEditor } from '../../../src/features/studio/model/editor';
import { bookshelf, floorstander } from './fixtures';

describe('lengths in the drawings and read-outs (typed lengths: form-units.test.ts)', () => {
  // 1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959; REFERENCES.md §8).
  it('shows inches as sixteenths and can leave the unit off', () => {
    expect(formatLength(314.325, 'in')).toBe('12 3/8"');
    expect(formatLength(314.325, 'in', { unit: false })).toBe('12 3/8');
    expect(formatLength(215, 'mm')).toBe('215 mm');
    expect(formatLength(215, 'mm', { unit: false })).toBe('215');
  });
});

describe('live figures', () => {
  it('are read from the engine plan, and an error keeps the last good figures marked stale', () => {
    const doc = bookshelf();
    const ok = planDesign(doc) as PlanOutcome;
    expect(ok.ok).toBe(true);
    const first = nextFigures(EMPTY_FIGURES, doc, ok);
    expect(first.stale).toBe(false);
    expect(first.figures!.netLitres).toBe(ok.ok && ok.plan.volumes.netLitres);
    expect(first.figures!.panelCount).toBe(ok.ok && ok.plan.panels.reduce((n, p) => n + p.quantity, 0));
    expect(first.figures!.port!.portIndexes).toEqual([2]);

    const broken = { ...doc, braces: [{ ...doc.braces[0]!, position: 5000 }] };
    const bad = planDesign(broken) as PlanOutcome;
    expect(bad.ok).toBe(false);
    const second = nextFigures(first, broken, bad);
    expect(second.stale).toBe(true);
    expect(second.figures).toBe(first.figures);
    expect(Object.keys(second.error!.fields)).toContain('braces[0].position');
  });

  it('a port air-speed limit of 5 % of the speed of sound (REFERENCES.md §6, common practice)', () => {
    const doc = bookshelf();
    const r = planDesign(doc) as PlanOutcome;
    const f = nextFigures(EMPTY_FIGURES, doc, r).figures!;
    expect(f.port!.airSpeedLimitMs).toBeCloseTo(0.05 * (r.ok ? r.plan.port!.speedOfSoundMs! : 0), 9);
  });
});

describe('one-click port length', () => {
  it.each([
    ['bookshelf', bookshelf],
    ['floorstander', floorstander],
  ] as const)('applying the length for the target tunes the %s to its target (0.1 mm rounding: within 0.02 Hz)', (_name, make) => {
    const ed = new StudioEditor(make());
    const r = planDesign(ed.doc) as PlanOutcome;
    const f = nextFigures(EMPTY_FIGURES, ed.doc, r).figures!;
    expect(ed.applyPortLength(f.port!.portIndexes, f.port!.lengthForTargetMm!)).toBe(true);
    expect(ed.getState().history.undo).toHaveLength(1);
    const after = planDesign(ed.doc) as PlanOutcome;
    expect(after.ok).toBe(true);
    const port = after.ok ? after.plan.port! : null;
    expect(Math.abs(port!.tuningHz - f.port!.targetHz!)).toBeLessThan(0.02);
  });
});

describe('what changed between two versions', () => {
  it('lists changed fields with plain labels, and nothing for equal designs in another key order', () => {
    const mine = bookshelf();
    const theirs = { ...mine, outer: { ...mine.outer, depth: 280 }, braces: [{ ...mine.braces[0]!, position: 230 }] };
    const changes = diffDesigns(theirs, mine);
    expect(changes.map((c) => [c.path, c.label])).toEqual([
      ['outer.depth', 'Outer depth'],
      ['braces[0].position', 'Brace 1 (shelf): position'],
    ]);
    expect(changes[0]).toMatchObject({ theirs: 280, mine: 260 });
    const reordered = JSON.parse(JSON.stringify(Object.fromEntries(Object.entries(mine).reverse())));
    expect(diffDesigns(mine, reordered)).toEqual([]);
  });

  it('an added opening is one change', () => {
    const mine = bookshelf();
    const theirs = { ...mine, openings: mine.openings.slice(0, 3) };
    expect(diffDesigns(theirs, mine).map((c) => c.label)).toEqual(['Opening 4 (terminal)']);
  });
});
