/**
 * Undo history as a stack of patches with marks (after tldraw's HistoryManager): each entry holds, per
 * top-level key of the design that changed, the value before and after. A drag opens a mark; every move
 * inside it merges into that one entry, so a drag is undone in one step.
 */
import type { Selection, StudioDoc } from './types';

type DocKey = keyof StudioDoc;

export interface Patch {
  key: DocKey;
  before: unknown;
  after: unknown;
}

export interface HistoryEntry {
  patches: Patch[];
  selectionBefore: Selection;
  selectionAfter: Selection;
  /** Set while a mark (a drag) is open; moves with the same mark merge into this entry. */
  mark: string | null;
}

export interface HistoryState {
  undo: HistoryEntry[];
  redo: HistoryEntry[];
  /** The open mark, if a drag is in progress. */
  openMark: string | null;
}

export const MAX_HISTORY = 200;

export function emptyHistory(): HistoryState {
  return { undo: [], redo: [], openMark: null };
}

/** The top-level keys whose values differ (by reference: commands never mutate, they copy what they change). */
export function diffDocs(before: StudioDoc, after: StudioDoc): Patch[] {
  const keys = new Set([...Object.keys(before), ...Object.keys(after)] as DocKey[]);
  const patches: Patch[] = [];
  for (const key of keys) {
    if (before[key] !== after[key]) patches.push({ key, before: before[key], after: after[key] });
  }
  return patches;
}

function applySide(doc: StudioDoc, patches: Patch[], side: 'before' | 'after'): StudioDoc {
  const next: Record<string, unknown> = { ...doc };
  for (const p of patches) {
    const value = p[side];
    if (value === undefined) delete next[p.key];
    else next[p.key] = value;
  }
  return next as StudioDoc;
}

/** Opens a mark: the next 'merge' changes fold into one entry until the mark is closed. */
export function openMark(h: HistoryState, mark: string): HistoryState {
  return { ...h, openMark: mark };
}

export function closeMark(h: HistoryState): HistoryState {
  return { ...h, openMark: null };
}

/**
 * Records one change. 'merge' folds into the top entry when it belongs to the open mark (keeping the
 * earliest `before` of each key); otherwise it starts the mark's entry. Any recorded change clears redo.
 */
export function recordChange(
  h: HistoryState,
  before: StudioDoc,
  after: StudioDoc,
  selectionBefore: Selection,
  selectionAfter: Selection,
  mode: 'record' | 'merge',
): HistoryState {
  const patches = diffDocs(before, after);
  if (patches.length === 0) return h;
  const top = h.undo[h.undo.length - 1];
  if (mode === 'merge' && h.openMark !== null && top && top.mark === h.openMark) {
    const merged = new Map<DocKey, Patch>(top.patches.map((p) => [p.key, p]));
    for (const p of patches) {
      const earlier = merged.get(p.key);
      merged.set(p.key, { key: p.key, before: earlier ? earlier.before : p.before, after: p.after });
    }
    const entry: HistoryEntry = { ...top, patches: [...merged.values()], selectionAfter };
    return { ...h, undo: [...h.undo.slice(0, -1), entry], redo: [] };
  }
  const entry: HistoryEntry = {
    patches,
    selectionBefore,
    selectionAfter,
    mark: mode === 'merge' ? h.openMark : null,
  };
  const undo = [...h.undo, entry];
  return { ...h, undo: undo.length > MAX_HISTORY ? undo.slice(-MAX_HISTORY) : undo, redo: [] };
}

export interface Restored {
  history: HistoryState;
  doc: StudioDoc;
  selection: Selection;
}

export function undo(h: HistoryState, doc: StudioDoc): Restored | null {
  const entry = h.undo[h.undo.length - 1];
  if (!entry) return null;
  return {
    history: { undo: h.undo.slice(0, -1), redo: [...h.redo, entry], openMark: null },
    doc: applySide(doc, entry.patches, 'before'),
    selection: entry.selectionBefore,
  };
}

export function redo(h: HistoryState, doc: StudioDoc): Restored | null {
  const entry = h.redo[h.redo.length - 1];
  if (!entry) return null;
  return {
    history: { undo: [...h.undo, entry], redo: h.redo.slice(0, -1), openMark: null },
    doc: applySide(doc, entry.patches, 'after'),
    selection: entry.selectionAfter,
  };
}

/**
 * Drops the open mark's entry and returns the document as it was before the mark (Escape during a drag:
 * tldraw's bailToMark).
 */
export function bailToMark(h: HistoryState, doc: StudioDoc): Restored | null {
  const top = h.undo[h.undo.length - 1];
  if (h.openMark === null || !top || top.mark !== h.openMark) return null;
  return {
    history: { undo: h.undo.slice(0, -1), redo: h.redo, openMark: null },
    doc: applySide(doc, top.patches, 'before'),
    selection: top.selectionBefore,
  };
}
