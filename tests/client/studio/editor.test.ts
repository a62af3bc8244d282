import { describe, expect, it, vi } from 'vitest';
import { bookshelf, floorstander } from './fixtures';
import { drag, makeEditor, screenOf } from './editor-helpers';

describe('dragging on the canvas', () => {
  it('drags a shelf brace up by 50 mm in the side section: one history entry; undo and redo', () => {
    const onCommit = vi.fn();
    const ed = makeEditor(bookshelf(), { grid: 'mm1', onCommit });
    drag(ed, 'side', 'brace:0', { z: 130, y: 215 }, 0, 50);
    const brace = ed.doc.braces[0]!;
    expect(brace.type === 'shelf' && brace.position).toBe(265);
    expect(ed.getState().history.undo).toHaveLength(1);
    expect(onCommit).toHaveBeenCalledTimes(1); // a drag reports once, when it ends
    expect(ed.undo()).toBe(true);
    expect(ed.doc.braces[0]).toMatchObject({ position: 215 });
    expect(ed.redo()).toBe(true);
    expect(ed.doc.braces[0]).toMatchObject({ position: 265 });
  });

  it('moves a shelf brace only along its axis, whatever the pointer does sideways', () => {
    const ed = makeEditor(bookshelf());
    drag(ed, 'side', 'brace:0', { z: 130, y: 215 }, 40, -60);
    expect(ed.doc.braces[0]).toMatchObject({ axis: 'y', position: 155 });
  });

  it('keeps a dragged brace inside the cavity (H − t − thickness/2)', () => {
    const ed = makeEditor(bookshelf());
    drag(ed, 'side', 'brace:0', { z: 130, y: 215 }, 0, 500);
    expect(ed.doc.braces[0]).toMatchObject({ position: 360 - 18 - 9 });
  });

  it('drags a rear port on the back face (seen through in the front view) and snaps to the 10 mm grid', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm10' });
    drag(ed, 'front', 'opening:2', { x: 110, y: 90 }, 23, 31.7);
    // x: 133 → centre-line snap only applies near 110 (cavity/box centre); grid → 130. y: 121.7 → 120.
    expect(ed.doc.openings[2]).toMatchObject({ x: 130, y: 120 });
  });

  it('snaps to the centre line of the face when close, and shows a guide while dragging', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm1' });
    const zoom = ed.getState().camera.zoom;
    const start = screenOf(ed, 'front', { x: 110, y: 135 });
    ed.pointerDown({ screen: start, hit: 'opening:0' });
    // 30 mm right, then back to 1.5 px off the centre line.
    ed.pointerMove({ screen: { x: start.x + 30 * zoom, y: start.y } });
    ed.pointerMove({ screen: { x: start.x + 1.5, y: start.y } });
    expect(ed.doc.openings[0]).toMatchObject({ x: 110 });
    expect(ed.getState().guides.some((g) => g.axis === 'x' && g.valueMm === 110)).toBe(true);
    ed.pointerUp();
    expect(ed.getState().guides).toEqual([]);
  });

  it('a brace snaps to other braces and the box centre, not to cut-out centres', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm1' });
    const zoom = ed.getState().camera.zoom;
    const start = screenOf(ed, 'side', { z: 30, y: 215 });
    ed.pointerDown({ screen: start, hit: 'brace:0' });
    // The terminal on the back sits at y = 290: a drag to 289 stays at 289.
    ed.pointerMove({ screen: { x: start.x, y: start.y - 74 * zoom } });
    expect(ed.doc.braces[0]).toMatchObject({ position: 289 });
    // The box centre, y = 180: a drag to 182 snaps onto it.
    ed.pointerMove({ screen: { x: start.x, y: start.y + 33 * zoom } });
    expect(ed.doc.braces[0]).toMatchObject({ position: 180 });
    ed.pointerUp();
  });

  it('drags a bar brace in both axes of the side section (its y and z)', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm1' });
    ed.addBrace('bar'); // along x, centred: at [y 180, z 130]
    const b = ed.doc.braces[1]!;
    expect(b).toMatchObject({ type: 'bar', axis: 'x', at: [180, 130] });
    drag(ed, 'side', 'brace:1', { z: 130, y: 180 }, -40, 60);
    expect(ed.doc.braces[1]).toMatchObject({ at: [240, 90] });
    expect(ed.getState().history.undo).toHaveLength(2); // the palette click and the drag
  });

  it('resizes the box by its right edge: the width follows, one undo step', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm5' });
    drag(ed, 'front', 'edge:x', { x: 220, y: 180 }, 31, 0);
    expect(ed.doc.outer.width).toBe(250);
    expect(ed.selection).toEqual({ kind: 'box' });
    ed.undo();
    expect(ed.doc.outer.width).toBe(220);
  });

  it('Escape during a drag puts the brace back and leaves no history', () => {
    const ed = makeEditor(bookshelf());
    const start = screenOf(ed, 'side', { z: 130, y: 215 });
    ed.pointerDown({ screen: start, hit: 'brace:0' });
    ed.pointerMove({ screen: { x: start.x, y: start.y - 60 } });
    expect(ed.keyDown({ key: 'Escape' })).toBe(true);
    expect(ed.doc.braces[0]).toMatchObject({ position: 215 });
    expect(ed.getState().history.undo).toHaveLength(0);
  });

  it('a click without movement only selects', () => {
    const ed = makeEditor(floorstander());
    const p = screenOf(ed, 'side', { z: 150, y: 620 });
    ed.pointerDown({ screen: p, hit: 'brace:1' });
    ed.pointerMove({ screen: { x: p.x + 1, y: p.y + 1 } });
    ed.pointerUp();
    expect(ed.selection).toEqual({ kind: 'brace', index: 1 });
    expect(ed.getState().history.undo).toHaveLength(0);
  });

  it('pressing on the background clears the selection and pans', () => {
    const ed = makeEditor(bookshelf());
    ed.select({ kind: 'brace', index: 0 });
    const cam = ed.getState().camera;
    ed.pointerDown({ screen: { x: 5, y: 5 }, hit: null });
    ed.pointerMove({ screen: { x: 45, y: 25 } });
    ed.pointerUp();
    expect(ed.selection).toBeNull();
    expect(ed.getState().camera).toMatchObject({ x: cam.x + 40, y: cam.y + 20 });
  });
});

describe('keyboard', () => {
  it('arrow keys nudge by one grid step, Shift by ten; each nudge is undoable', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm5' });
    ed.select({ kind: 'brace', index: 0 });
    ed.setActiveView('side');
    expect(ed.keyDown({ key: 'ArrowUp' })).toBe(true);
    expect(ed.doc.braces[0]).toMatchObject({ position: 220 });
    ed.keyDown({ key: 'ArrowDown', shiftKey: true });
    expect(ed.doc.braces[0]).toMatchObject({ position: 170 });
    ed.keyDown({ key: 'z', ctrlKey: true });
    expect(ed.doc.braces[0]).toMatchObject({ position: 220 });
    ed.keyDown({ key: 'Z', ctrlKey: true, shiftKey: true });
    expect(ed.doc.braces[0]).toMatchObject({ position: 170 });
    ed.keyDown({ key: 'z', metaKey: true });
    ed.keyDown({ key: 'y', ctrlKey: true });
    expect(ed.doc.braces[0]).toMatchObject({ position: 170 });
  });

  it('nudges in sixteenths of an inch on the 1/16 in grid, landing on grid lines', () => {
    const ed = makeEditor(bookshelf(), { grid: 'in16' });
    ed.select({ kind: 'opening', index: 0 });
    ed.setActiveView('front');
    ed.keyDown({ key: 'ArrowRight' });
    // 110 mm = 69.29 sixteenths → the next line up is 70/16 in = 111.125 mm (derived from 25.4 mm/in).
    expect((ed.doc.openings[0]!.x! / 25.4) * 16).toBeCloseTo(70, 9);
    ed.keyDown({ key: 'ArrowRight' });
    expect(ed.doc.openings[0]!.x).toBeCloseTo((71 * 25.4) / 16, 9);
  });

  it('an arrow that the active view cannot use falls back to a view where the item moves that way', () => {
    const ed = makeEditor(bookshelf(), { grid: 'mm1' });
    ed.select({ kind: 'brace', index: 0 }); // moves along y only
    ed.setActiveView('top'); // top section shows x and z
    ed.keyDown({ key: 'ArrowUp' });
    expect(ed.doc.braces[0]).toMatchObject({ position: 216 });
  });

  it('Delete removes the selection; Escape clears it', () => {
    const ed = makeEditor(bookshelf());
    ed.select({ kind: 'opening', index: 3 });
    expect(ed.keyDown({ key: 'Delete' })).toBe(true);
    expect(ed.doc.openings).toHaveLength(3);
    ed.select({ kind: 'brace', index: 0 });
    ed.keyDown({ key: 'Escape' });
    expect(ed.selection).toBeNull();
  });
});

describe('read-only (makers and viewers)', () => {
  it('blocks drags, nudges, deletes, palette additions and undo, but still selects', () => {
    const ed = makeEditor(bookshelf(), { readOnly: true });
    const before = ed.doc;
    drag(ed, 'side', 'brace:0', { z: 130, y: 215 }, 0, 50);
    expect(ed.selection).toEqual({ kind: 'brace', index: 0 });
    expect(ed.keyDown({ key: 'ArrowUp' })).toBe(false);
    expect(ed.keyDown({ key: 'Delete' })).toBe(false);
    expect(ed.addBrace('shelf')).toBe(false);
    expect(ed.addOpening('driver')).toBe(false);
    expect(ed.setField(['outer', 'width'], 300)).toBe(false);
    expect(ed.applyPortLength([2], 150)).toBe(false);
    expect(ed.undo()).toBe(false);
    expect(ed.doc).toBe(before);
    expect(ed.getState().history.undo).toHaveLength(0);
  });
});

describe('camera', () => {
  it('zooms about the pointer: the world point under it stays put', () => {
    const ed = makeEditor(bookshelf());
    const p = { x: 400, y: 300 };
    const w0 = ed.screenToWorld(p);
    ed.zoomAt(p, 1.7);
    const w1 = ed.screenToWorld(p);
    expect(w1.x).toBeCloseTo(w0.x, 9);
    expect(w1.y).toBeCloseTo(w0.y, 9);
  });

  it('fit to view puts every drawing inside the viewport', () => {
    const ed = makeEditor(floorstander());
    ed.fitToView({ width: 900, height: 600 });
    const b = ed.layout().bounds;
    const a = ed.worldToScreen({ x: b.minX, y: b.minY });
    const c = ed.worldToScreen({ x: b.maxX, y: b.maxY });
    for (const p of [a, c]) {
      expect(p.x).toBeGreaterThanOrEqual(0);
      expect(p.x).toBeLessThanOrEqual(900);
      expect(p.y).toBeGreaterThanOrEqual(0);
      expect(p.y).toBeLessThanOrEqual(600);
    }
  });
});
