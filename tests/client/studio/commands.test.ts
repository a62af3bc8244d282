import { describe, expect, it } from 'vitest';
import { designSchema } from '../../../shared/schemas/design.schema';
import {
  addBraceCommand,
  addOpeningCommand,
  applyPortLengthCommand,
  deleteSelectionCommand,
  moveItemCommand,
  newBrace,
  OPENING_KINDS,
  replaceDocCommand,
  resizeBoxCommand,
  setFieldCommand,
  setOpeningFaceCommand,
} from '../../../src/features/studio/model/commands';
import { cavity } from '../../../src/features/studio/model/geometry';
import { bookshelf, floorstander } from './fixtures';

describe('commands', () => {
  it('never mutate the document they are given', () => {
    const doc = bookshelf();
    const frozen = JSON.stringify(doc);
    addBraceCommand.perform(doc, null, { kind: 'shelf' });
    moveItemCommand.perform(doc, { kind: 'brace', index: 0 }, { coords: { y: 100 } });
    setFieldCommand.perform(doc, null, { path: ['outer', 'width'], value: 300 });
    deleteSelectionCommand.perform(doc, { kind: 'opening', index: 0 }, {});
    expect(JSON.stringify(doc)).toBe(frozen);
  });

  it('the internal cavity is (W−2t)×(H−2t)×(D−tf−t) (PRODUCT.md §3)', () => {
    const c = cavity(floorstander()); // 200×1000×300, t = 18, tf = 25
    expect([c.x.max - c.x.min, c.y.max - c.y.min, c.z.max - c.z.min]).toEqual([164, 964, 257]);
    expect(c.z.min).toBe(25);
  });

  it('a new shelf brace goes into the largest free stretch between existing braces, one material thick', () => {
    // Braces at 380 and 620; cavity y 18…982: free stretches 362, 240 and 362 mm; the first largest wins.
    const doc = floorstander();
    expect(newBrace(doc, 'shelf')).toMatchObject({ type: 'shelf', axis: 'y', position: (18 + 380) / 2, thickness: 18 });
    const upper = { ...doc, braces: doc.braces.map((b) => (b.type === 'shelf' ? { ...b, position: b.position - 100 } : b)) };
    expect(newBrace(upper, 'shelf')).toMatchObject({ position: (520 + 982) / 2 });
  });

  it('every palette item adds a design the shared schema accepts, and selects it', () => {
    let doc = bookshelf();
    for (const { kind } of OPENING_KINDS) {
      const r = addOpeningCommand.perform(doc, null, { kind })!;
      expect(r.selection).toEqual({ kind: 'opening', index: r.doc.openings.length - 1 });
      doc = r.doc;
    }
    for (const kind of ['shelf', 'bar'] as const) doc = addBraceCommand.perform(doc, null, { kind })!.doc;
    expect(designSchema.safeParse(doc).success).toBe(true);
    expect(doc.openings.map((o) => o.type)).toEqual(['driver', 'driver', 'port', 'terminal', 'driver', 'port', 'port', 'terminal', 'lead']);
  });

  it('moveItem keeps an opening on its face: the cut-out stays inside the outer face', () => {
    const doc = bookshelf();
    const r = moveItemCommand.perform(doc, { kind: 'opening', index: 0 }, { coords: { x: -50, y: 1000 } })!;
    // Woofer rebate 134 mm → centre between 67 and W−67 / H−67.
    expect(r.doc.openings[0]).toMatchObject({ x: 67, y: 360 - 67 });
  });

  it('moveItem of a bar brace moves both of its `at` coordinates', () => {
    const doc = addBraceCommand.perform(bookshelf(), null, { kind: 'bar' })!.doc;
    const r = moveItemCommand.perform(doc, { kind: 'brace', index: 1 }, { coords: { y: 100, z: 60, x: 5 } })!;
    expect(r.doc.braces[1]).toMatchObject({ type: 'bar', axis: 'x', at: [100, 60] });
  });

  it('resizeBox never goes below the panels plus 10 mm of air', () => {
    const r = resizeBoxCommand.perform(bookshelf(), null, { axis: 'z', sizeMm: 5 })!;
    expect(r.doc.outer.depth).toBe(18 + 18 + 10);
  });

  it('setField writes one value by path and removes optional ones with undefined', () => {
    const doc = bookshelf();
    const r = setFieldCommand.perform(doc, null, { path: ['braces', 0, 'thickness'], value: 25 })!;
    expect(r.doc.braces[0]).toMatchObject({ thickness: 25 });
    expect(r.doc.openings).toBe(doc.openings);
    const r2 = setFieldCommand.perform(doc, null, { path: ['baffleThickness'], value: undefined })!;
    expect('baffleThickness' in r2.doc).toBe(false);
    expect(setFieldCommand.perform(doc, null, { path: ['outer', 'width'], value: 220 })).toBeNull();
  });

  it('moving an opening to another face keeps the shared coordinate and centres the other', () => {
    const doc = bookshelf();
    const r = setOpeningFaceCommand.perform(doc, null, { index: 3, face: 'left' })!;
    const o = r.doc.openings[3]!;
    expect(o).toMatchObject({ face: 'left', y: 290, z: 130 });
    expect(o.x).toBeUndefined();
    expect(designSchema.safeParse(r.doc).success).toBe(true);
  });

  it('applyPortLength sets the port length (to 0.1 mm) and refuses non-ports', () => {
    const doc = bookshelf();
    expect(applyPortLengthCommand.perform(doc, null, { indexes: [2], lengthMm: 143.26 })!.doc.openings[2]).toMatchObject({ length: 143.3 });
    expect(applyPortLengthCommand.perform(doc, null, { indexes: [0], lengthMm: 100 })).toBeNull();
  });

  it('deleting drops the item and the selection; replacing keeps a selection that still exists', () => {
    const doc = bookshelf();
    const r = deleteSelectionCommand.perform(doc, { kind: 'brace', index: 0 }, {})!;
    expect(r.doc.braces).toHaveLength(0);
    expect(r.selection).toBeNull();
    const back = replaceDocCommand.perform(r.doc, { kind: 'opening', index: 3 }, { doc: { ...doc, openings: doc.openings.slice(0, 2) } })!;
    expect(back.selection).toBeNull();
  });
});
