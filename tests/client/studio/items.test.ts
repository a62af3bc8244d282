/**
 * The inspector's item helpers: names, shape changes and optional parts. Every result must still be a design the
 * shared schema accepts and the cabinet engine can plan. Demo data: PRODUCT.md §9 (invented).
 */
import { describe, expect, it } from 'vitest';
import { planDesign } from '../../../shared/cabinet/index';
import { designSchema, type PortOpening, type TerminalOpening } from '../../../shared/schemas/design.schema';
import {
  defaultRebate,
  defaultScrewHoles,
  describeField,
  listItems,
  plainMessage,
  withLinedFace,
  withPortShape,
  withTerminalShape,
  withWindowShape,
} from '../../../src/features/studio/model/items';
import { bookshelf, floorstander } from './fixtures';

describe('item names', () => {
  it('number braces and openings per kind, in document order', () => {
    expect(listItems(bookshelf()).map((i) => i.label)).toEqual(['Shelf brace 1', 'Driver 1', 'Driver 2', 'Round port 1', 'Terminal 1']);
    expect(listItems(floorstander()).map((i) => i.label)).toEqual([
      'Shelf brace 1',
      'Shelf brace 2',
      'Driver 1',
      'Driver 2',
      'Driver 3',
      'Round port 1',
      'Terminal 1',
    ]);
  });
});

describe('messages name items as the studio does', () => {
  it('field paths of the engine and the API read as words', () => {
    const doc = bookshelf();
    expect(describeField(doc, 'braces[0].position')).toBe('Shelf brace 1, position');
    expect(describeField(doc, 'openings[2].length')).toBe('Round port 1, length');
    expect(describeField(doc, 'openings[0].screwHoles.circleDiameter')).toBe('Driver 1, screw holes circle diameter');
    expect(describeField(doc, 'braces[0].windows[0].width')).toBe('Shelf brace 1, window 1 width');
    expect(describeField(doc, 'outer.width')).toBe('Outer width');
    expect(describeField(doc, 'lining.thickness')).toBe('Lining thickness');
  });

  it('item paths inside a message become item names; the first letter is a capital', () => {
    const doc = bookshelf();
    expect(plainMessage(doc, 'The port tube at openings[2] crosses shelf brace 1')).toBe('The port tube at Round port 1 crosses shelf brace 1');
    expect(plainMessage(doc, 'a brace at y = 500 mm is outside the cavity')).toBe('A brace at y = 500 mm is outside the cavity');
    // A path to a field inside an item is left as it is (it names more than the item).
    expect(plainMessage(doc, 'see openings[2].length')).toBe('See openings[2].length');
  });
});

describe('shape changes', () => {
  it('a rectangular window turned round keeps its centre and fits inside the old one; back again it is a square', () => {
    const w = { shape: 'rect' as const, u: 110, v: 130, width: 110, height: 120 };
    const round = withWindowShape(w, 'round');
    expect(round).toEqual({ shape: 'round', u: 110, v: 130, diameter: 110 });
    expect(withWindowShape(round, 'rect')).toEqual({ shape: 'rect', u: 110, v: 130, width: 110, height: 110 });
    expect(withWindowShape(w, 'rect')).toBe(w);
  });

  it('a round port made a slot keeps its open area, and back (equal-area diameter d = 2√(wh/π), REFERENCES.md §1, common practice)', () => {
    const doc = bookshelf();
    const port = doc.openings[2] as PortOpening; // 50 mm bore
    const slot = withPortShape(doc, port, 'slot');
    expect(slot.shape).toBe('slot');
    expect(slot.diameter).toBeUndefined();
    const area = Math.PI * 25 ** 2; // 1963.5 mm²
    expect(Math.abs(slot.width! * slot.height! - area) / area).toBeLessThan(0.02); // heights are kept to 0.1 mm
    // REFERENCES.md §1: a 200 × 40 mm slot has the area of a 100.93 mm round port.
    const back = withPortShape(doc, { ...slot, width: 200, height: 40 }, 'round');
    expect(back.diameter).toBeCloseTo(100.9, 1);
    expect(back.width).toBeUndefined();
    for (const p of [slot, back]) {
      const design = designSchema.parse({ ...doc, openings: doc.openings.map((o, i) => (i === 2 ? p : o)) });
      expect(planDesign(design).ok).toBe(true);
    }
  });

  it('a terminal cut-out switches between rectangular and round', () => {
    const t = bookshelf().openings[3] as TerminalOpening;
    const round = withTerminalShape(t, 'round');
    expect(round).toMatchObject({ diameter: 60 });
    expect(round.width).toBeUndefined();
    expect(withTerminalShape(round, 'rect')).toMatchObject({ width: 60, height: 60 });
    expect(withTerminalShape(t, 'rect')).toBe(t);
  });
});

describe('optional parts', () => {
  it('a rebate and screw holes start around the cut-out, and the design still plans with them', () => {
    const doc = bookshelf();
    const d = { ...(doc.openings[1] as Extract<(typeof doc.openings)[number], { type: 'driver' }>), rebate: undefined };
    const rebate = defaultRebate(d);
    const screws = defaultScrewHoles(d);
    expect(rebate.diameter).toBeGreaterThan(d.diameter);
    expect(screws.circleDiameter).toBeGreaterThan(d.diameter);
    expect(screws.circleDiameter + screws.holeDiameter).toBeLessThanOrEqual(rebate.diameter);
    const design = designSchema.parse({ ...doc, openings: doc.openings.map((o, i) => (i === 1 ? { ...d, rebate, screwHoles: screws } : o)) });
    const r = planDesign(design);
    expect(r.ok).toBe(true);
    // Four screw holes more on the baffle than without them.
    const baffle = (p: typeof r) => (p.ok ? p.plan.panels.find((x) => x.name.startsWith('Front'))!.holes.length : -1);
    expect(baffle(r) - baffle(planDesign(designSchema.parse({ ...doc, openings: doc.openings.map((o, i) => (i === 1 ? { ...d, rebate } : o)) })))).toBe(4);
  });

  it('lining a face adds it last and unlining removes it; the default list stays as it was', () => {
    const lining = bookshelf().lining!;
    expect(withLinedFace(lining, 'back', true)).toBe(lining);
    const noTop = withLinedFace(lining, 'top', false);
    expect(noTop.faces).toEqual(['left', 'right', 'bottom', 'back']);
    expect(withLinedFace(noTop, 'front', true).faces).toEqual(['left', 'right', 'bottom', 'back', 'front']);
  });
});
