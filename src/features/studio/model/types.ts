/**
 * Shared types of the studio's editor model. The design JSON (shared/schemas/design.schema.ts) is the
 * document: plain data, never a konva node.
 */
import type { Design } from '../../../../shared/schemas/design.schema';

export type StudioDoc = Design;
export type UnitSystem = 'mm' | 'in';

/** What is selected: one brace, one opening, or the box itself (for its edges). */
export type Selection =
  | { kind: 'brace'; index: number }
  | { kind: 'opening'; index: number }
  | { kind: 'box' }
  | null;

/** The three views drawn on the canvas. */
export type ViewName = 'front' | 'side' | 'top';

/**
 * How an edit enters the undo history (excalidraw's CaptureUpdateAction, tldraw's marks):
 * - record: a new entry (a palette click, a typed value, a nudge);
 * - merge: folded into the entry of the current mark (the moves of one drag);
 * - skip: never recorded (selection changes, hover).
 */
export type HistoryMode = 'record' | 'merge' | 'skip';

export interface CommandResult {
  doc: StudioDoc;
  selection: Selection;
  history: HistoryMode;
}

export function sameSelection(a: Selection, b: Selection): boolean {
  if (a === null || b === null) return a === b;
  if (a.kind !== b.kind) return false;
  if (a.kind === 'box') return true;
  return (b as { index: number }).index === a.index;
}
