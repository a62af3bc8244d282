import { describe, expect, it } from 'vitest';
import * as H from '../../../src/features/studio/model/history';
import { bookshelf } from './fixtures';

const withWidth = (doc: ReturnType<typeof bookshelf>, width: number) => ({ ...doc, outer: { ...doc.outer, width } });

describe('history of patches with marks', () => {
  it('records only the top-level keys that changed', () => {
    const a = bookshelf();
    const b = withWidth(a, 250);
    const patches = H.diffDocs(a, b);
    expect(patches.map((p) => p.key)).toEqual(['outer']);
    expect((patches[0]!.before as { width: number }).width).toBe(220);
  });

  it('merges every move under one open mark into one entry (one entry per drag)', () => {
    const d0 = bookshelf();
    let h = H.openMark(H.emptyHistory(), 'drag-1');
    const d1 = withWidth(d0, 230);
    h = H.recordChange(h, d0, d1, null, { kind: 'box' }, 'merge');
    const d2 = withWidth(d1, 240);
    h = H.recordChange(h, d1, d2, { kind: 'box' }, { kind: 'box' }, 'merge');
    const d3 = withWidth(d2, 260);
    h = H.recordChange(h, d2, d3, { kind: 'box' }, { kind: 'box' }, 'merge');
    h = H.closeMark(h);
    expect(h.undo).toHaveLength(1);
    const back = H.undo(h, d3)!;
    expect(back.doc.outer.width).toBe(220);
    expect(back.selection).toBeNull();
    const again = H.redo(back.history, back.doc)!;
    expect(again.doc.outer.width).toBe(260);
  });

  it('a second drag after the mark closed is its own entry', () => {
    const d0 = bookshelf();
    let h = H.openMark(H.emptyHistory(), 'a');
    const d1 = withWidth(d0, 230);
    h = H.closeMark(H.recordChange(h, d0, d1, null, null, 'merge'));
    h = H.openMark(h, 'b');
    const d2 = withWidth(d1, 240);
    h = H.closeMark(H.recordChange(h, d1, d2, null, null, 'merge'));
    expect(h.undo).toHaveLength(2);
    expect(H.undo(h, d2)!.doc.outer.width).toBe(230);
  });

  it('a new change clears redo; no change records nothing', () => {
    const d0 = bookshelf();
    const d1 = withWidth(d0, 230);
    let h = H.recordChange(H.emptyHistory(), d0, d1, null, null, 'record');
    const u = H.undo(h, d1)!;
    expect(u.history.redo).toHaveLength(1);
    h = H.recordChange(u.history, u.doc, withWidth(u.doc, 300), null, null, 'record');
    expect(h.redo).toHaveLength(0);
    expect(H.recordChange(h, d0, d0, null, null, 'record')).toBe(h);
  });

  it('bailToMark drops the open drag and restores the document before it', () => {
    const d0 = bookshelf();
    let h = H.openMark(H.emptyHistory(), 'm');
    const d1 = withWidth(d0, 400);
    h = H.recordChange(h, d0, d1, null, null, 'merge');
    const r = H.bailToMark(h, d1)!;
    expect(r.doc.outer.width).toBe(220);
    expect(r.history.undo).toHaveLength(0);
    expect(r.history.openMark).toBeNull();
  });

  it('undo and redo on an empty stack do nothing', () => {
    expect(H.undo(H.emptyHistory(), bookshelf())).toBeNull();
    expect(H.redo(H.emptyHistory(), bookshelf())).toBeNull();
  });
});
