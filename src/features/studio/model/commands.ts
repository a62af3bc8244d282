/**
 * Editor commands (after excalidraw's actions): `perform(doc, selection, args) → {doc, selection, history}`
 * or null when the command does not apply. Commands never mutate; they copy what they change, so the
 * history can diff by reference. `edits: false` commands (selection) stay allowed in read-only mode.
 */
import { FACE_COORDS } from '../../../../shared/schemas/design.schema';
import type { Axis, Brace, Face, Opening } from '../../../../shared/schemas/design.schema';
import {
  AXIS_SIZE_KEY,
  cavity,
  clampToRange,
  itemCoordMm,
  itemRangeMm,
  minOuterSizeMm,
  movableAxes,
  outerSizeMm,
  withItemCoords,
} from './geometry';
import type { CommandResult, HistoryMode, Selection, StudioDoc } from './types';

export interface Command<A> {
  name: string;
  /** Whether the command changes the design (refused in read-only mode). */
  edits: boolean;
  perform(doc: StudioDoc, selection: Selection, args: A): CommandResult | null;
}

/** Positions are kept to 0.1 µm: exact for whole mm and for sixteenths of an inch (1.5875 mm). */
const roundPos = (v: number) => Math.round(v * 10000) / 10000;

export const selectCommand: Command<{ selection: Selection }> = {
  name: 'select',
  edits: false,
  perform: (doc, _sel, { selection }) => ({ doc, selection, history: 'skip' }),
};

/** Moves the selection's centre; each coordinate is kept inside the cavity or on its face. */
export const moveItemCommand: Command<{ coords: Partial<Record<Axis, number>>; history?: HistoryMode }> = {
  name: 'moveItem',
  edits: true,
  perform(doc, sel, { coords, history = 'record' }) {
    const axes = movableAxes(doc, sel);
    const clamped: Partial<Record<Axis, number>> = {};
    for (const axis of axes) {
      const v = coords[axis];
      if (v !== undefined) clamped[axis] = roundPos(clampToRange(v, itemRangeMm(doc, sel, axis)));
    }
    const next = withItemCoords(doc, sel, clamped);
    return next === doc ? null : { doc: next, selection: sel, history };
  },
};

/** Nudges the selection by a step along box axes (arrow keys; the view decides which axes). */
export const nudgeCommand: Command<{ delta: Partial<Record<Axis, number>> }> = {
  name: 'nudge',
  edits: true,
  perform(doc, sel, { delta }) {
    const coords: Partial<Record<Axis, number>> = {};
    for (const axis of movableAxes(doc, sel)) {
      const d = delta[axis];
      const c = itemCoordMm(doc, sel, axis);
      if (d && c !== null) coords[axis] = c + d;
    }
    return moveItemCommand.perform(doc, sel, { coords, history: 'record' });
  },
};

/** Sets an outer size (dragging the right, top or back edge, or a typed value). */
export const resizeBoxCommand: Command<{ axis: Axis; sizeMm: number; history?: HistoryMode }> = {
  name: 'resizeBox',
  edits: true,
  perform(doc, sel, { axis, sizeMm, history = 'record' }) {
    const size = roundPos(Math.max(minOuterSizeMm(doc, axis), sizeMm));
    if (size === outerSizeMm(doc, axis)) return null;
    return { doc: { ...doc, outer: { ...doc.outer, [AXIS_SIZE_KEY[axis]]: size } }, selection: sel, history };
  },
};

export type BraceKind = 'shelf' | 'bar';

/** A new brace in the middle of the cavity: a shelf across y with one round window, or a bar along x. */
export function newBrace(doc: StudioDoc, kind: BraceKind): Brace {
  const cav = cavity(doc);
  const mid = (a: Axis) => roundPos((cav[a].min + cav[a].max) / 2);
  if (kind === 'bar') {
    return { type: 'bar', axis: 'x', at: [mid('y'), mid('z')], section: [30, 30] };
  }
  const spanX = cav.x.max - cav.x.min;
  const spanZ = cav.z.max - cav.z.min;
  // Put it in the middle of the largest free stretch of y between the existing shelf braces.
  const taken = doc.braces
    .filter((b): b is Extract<Brace, { type: 'shelf' }> => b.type === 'shelf' && b.axis === 'y')
    .map((b) => b.position)
    .sort((a, b) => a - b);
  const stops = [cav.y.min, ...taken, cav.y.max];
  let best = { at: mid('y'), gap: -1 };
  for (let i = 0; i + 1 < stops.length; i++) {
    const gap = stops[i + 1]! - stops[i]!;
    if (gap > best.gap) best = { at: roundPos((stops[i]! + stops[i + 1]!) / 2), gap };
  }
  return {
    type: 'shelf',
    axis: 'y',
    position: best.at,
    thickness: doc.material.thickness,
    windows: [{ shape: 'round', u: mid('x'), v: mid('z'), diameter: roundPos(Math.max(10, Math.min(spanX, spanZ) * 0.5)) }],
  };
}

export const addBraceCommand: Command<{ kind: BraceKind }> = {
  name: 'addBrace',
  edits: true,
  perform(doc, _sel, { kind }) {
    const braces = [...doc.braces, newBrace(doc, kind)];
    return { doc: { ...doc, braces }, selection: { kind: 'brace', index: braces.length - 1 }, history: 'record' };
  },
};

export type OpeningKind = 'driver' | 'roundPort' | 'slotPort' | 'terminal' | 'lead';

/** Palette entries: plain trade names. */
export const OPENING_KINDS: readonly { kind: OpeningKind; label: string }[] = [
  { kind: 'driver', label: 'Driver' },
  { kind: 'roundPort', label: 'Round port' },
  { kind: 'slotPort', label: 'Slot port' },
  { kind: 'terminal', label: 'Terminal' },
  { kind: 'lead', label: 'Cable lead' },
];
export const BRACE_KINDS: readonly { kind: BraceKind; label: string }[] = [
  { kind: 'shelf', label: 'Shelf brace' },
  { kind: 'bar', label: 'Bar brace' },
];

/** Sensible first sizes (our choice; the designer edits them): they fit on small bookshelf cabinets. */
export function newOpening(doc: StudioDoc, kind: OpeningKind): Opening {
  const { width: W, height: H, depth: D } = doc.outer;
  const t = doc.material.thickness;
  const innerDepth = D - t - (doc.baffleThickness ?? t);
  const small = Math.min(W, H);
  switch (kind) {
    case 'driver':
      return { type: 'driver', face: 'front', x: roundPos(W / 2), y: roundPos(H / 2), diameter: roundPos(Math.min(100, small * 0.6)), displacementLitres: 0 };
    case 'roundPort': {
      const diameter = roundPos(Math.min(50, small * 0.3));
      return {
        type: 'port', face: 'back', shape: 'round', x: roundPos(W / 2), y: roundPos(Math.max(t + diameter, H / 4)),
        diameter, wall: 3, length: roundPos(Math.max(t + 10, Math.min(120, innerDepth * 0.5))),
      };
    }
    case 'slotPort': {
      const height = roundPos(Math.min(30, H * 0.1));
      return {
        type: 'port', face: 'front', shape: 'slot', x: roundPos(W / 2), y: roundPos(t + height / 2 + 10),
        width: roundPos(Math.max(10, (W - 2 * t) * 0.6)), height, wall: 0, length: roundPos(Math.max(t + 10, Math.min(150, innerDepth * 0.5))),
      };
    }
    case 'terminal':
      return { type: 'terminal', face: 'back', x: roundPos(W / 2), y: roundPos(Math.max(40, H * 0.8)), width: roundPos(Math.min(60, small * 0.3)), height: roundPos(Math.min(60, small * 0.3)) };
    case 'lead':
      return { type: 'lead', face: 'back', x: roundPos(W / 2), y: roundPos(H / 2), diameter: 10 };
  }
}

export const addOpeningCommand: Command<{ kind: OpeningKind }> = {
  name: 'addOpening',
  edits: true,
  perform(doc, _sel, { kind }) {
    const openings = [...doc.openings, newOpening(doc, kind)];
    return { doc: { ...doc, openings }, selection: { kind: 'opening', index: openings.length - 1 }, history: 'record' };
  },
};

export const deleteSelectionCommand: Command<Record<string, never>> = {
  name: 'deleteSelection',
  edits: true,
  perform(doc, sel) {
    if (sel?.kind === 'brace' && doc.braces[sel.index]) {
      return { doc: { ...doc, braces: doc.braces.filter((_, i) => i !== sel.index) }, selection: null, history: 'record' };
    }
    if (sel?.kind === 'opening' && doc.openings[sel.index]) {
      return { doc: { ...doc, openings: doc.openings.filter((_, i) => i !== sel.index) }, selection: null, history: 'record' };
    }
    return null;
  },
};

export type FieldPath = ReadonlyArray<string | number>;

/** Reads a value at a path such as ['braces', 0, 'position']. */
export function getAtPath(doc: unknown, path: FieldPath): unknown {
  let cur: unknown = doc;
  for (const key of path) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string | number, unknown>)[key];
  }
  return cur;
}

function setIn(obj: unknown, path: FieldPath, value: unknown): unknown {
  if (path.length === 0) return value;
  const [key, ...rest] = path as [string | number, ...(string | number)[]];
  if (Array.isArray(obj)) {
    const next = obj.slice();
    next[key as number] = setIn(obj[key as number], rest, value);
    return next;
  }
  const base = (obj ?? {}) as Record<string | number, unknown>;
  const next = { ...base };
  const child = setIn(base[key], rest, value);
  if (child === undefined) delete next[key];
  else next[key] = child;
  return next;
}

/** Sets one field (a typed value in the inspector); undefined removes an optional field. */
export const setFieldCommand: Command<{ path: FieldPath; value: unknown }> = {
  name: 'setField',
  edits: true,
  perform(doc, sel, { path, value }) {
    if (Object.is(getAtPath(doc, path), value)) return null;
    return { doc: setIn(doc, path, value) as StudioDoc, selection: sel, history: 'record' };
  },
};

/** Moves an opening to another face, keeping the coordinate the two faces share and centring the other. */
export const setOpeningFaceCommand: Command<{ index: number; face: Face }> = {
  name: 'setOpeningFace',
  edits: true,
  perform(doc, sel, { index, face }) {
    const o = doc.openings[index];
    if (!o || o.face === face) return null;
    const next: Opening = { ...o, face, x: undefined, y: undefined, z: undefined };
    for (const axis of FACE_COORDS[face]) {
      next[axis] = FACE_COORDS[o.face].includes(axis) ? o[axis] : roundPos(outerSizeMm(doc, axis) / 2);
    }
    for (const axis of ['x', 'y', 'z'] as const) if (next[axis] === undefined) delete next[axis];
    const openings = doc.openings.slice();
    openings[index] = next;
    return { doc: { ...doc, openings }, selection: sel, history: 'record' };
  },
};

/** One click: set the ports' length to the length that reaches the target tuning (figures panel). */
export const applyPortLengthCommand: Command<{ indexes: readonly number[]; lengthMm: number }> = {
  name: 'applyPortLength',
  edits: true,
  perform(doc, sel, { indexes, lengthMm }) {
    if (!(lengthMm > 0)) return null;
    const length = Math.round(lengthMm * 10) / 10;
    const openings = doc.openings.slice();
    let changed = false;
    for (const index of indexes) {
      const o = openings[index];
      if (!o || o.type !== 'port' || o.length === length) continue;
      openings[index] = { ...o, length };
      changed = true;
    }
    return changed ? { doc: { ...doc, openings }, selection: sel, history: 'record' } : null;
  },
};

/** Takes a whole design from outside (the side form); one history entry. */
export const replaceDocCommand: Command<{ doc: StudioDoc }> = {
  name: 'replaceDoc',
  edits: true,
  perform(_doc, sel, { doc }) {
    const keep =
      sel?.kind === 'brace' ? (doc.braces[sel.index] ? sel : null) : sel?.kind === 'opening' ? (doc.openings[sel.index] ? sel : null) : sel;
    return { doc, selection: keep, history: 'record' };
  },
};
