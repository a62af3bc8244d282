/**
 * The headless studio editor: the document store, the undo history, the camera and the drag tool as a
 * small state machine (idle → pointing → dragging, plus panning). It has no DOM and no konva; the canvas
 * feeds it pointer and key events in screen pixels and renders its state. Tests drive it directly.
 */
import type { Axis } from '../../../../shared/schemas/design.schema';
import {
  addBraceCommand,
  addOpeningCommand,
  applyPortLengthCommand,
  deleteSelectionCommand,
  moveItemCommand,
  nudgeCommand,
  replaceDocCommand,
  resizeBoxCommand,
  selectCommand,
  setFieldCommand,
  setOpeningFaceCommand,
  type Command,
} from './commands';
import { centreLinesMm, itemCoordMm, movableAxes, outerSizeMm } from './geometry';
import * as H from './history';
import { nudgeStepMm, snapCoordinate, snapToGrid, type GridId } from './snapping';
import { sameSelection, type Selection, type StudioDoc, type UnitSystem, type ViewName } from './types';
import { layoutViews, parseHit, VIEW_AXES, VIEWS, type HitId, type WorldLayout } from './views';

export interface Camera {
  /** Screen pixels per millimetre. */
  zoom: number;
  /** Screen position of the world origin. */
  x: number;
  y: number;
}

export interface Point {
  x: number;
  y: number;
}

export type ToolState =
  | { name: 'idle' }
  | { name: 'pointing'; hit: HitId | null; view: ViewName | null; downScreen: Point }
  | {
      name: 'dragging';
      hit: HitId;
      view: ViewName;
      downScreen: Point;
      /** Coordinates of the item (or the outer size for an edge) when the drag began. */
      start: Partial<Record<Axis, number>>;
      layout: WorldLayout;
      /** The history mark this drag's moves merge under. */
      mark: string;
    }
  | { name: 'panning'; downScreen: Point; startCamera: Camera };

export interface Guide {
  view: ViewName;
  axis: Axis;
  valueMm: number;
}

export interface EditorState {
  doc: StudioDoc;
  selection: Selection;
  history: H.HistoryState;
  readOnly: boolean;
  grid: GridId;
  units: UnitSystem;
  activeView: ViewName;
  camera: Camera;
  tool: ToolState;
  /** Centre lines the current drag snapped to. */
  guides: Guide[];
  /** Counts document changes, for cheap change detection by the canvas and figures. */
  docVersion: number;
}

export interface KeyInput {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  shiftKey?: boolean;
  altKey?: boolean;
}

export interface PointerInput {
  screen: Point;
  /** The primitive under the pointer, if any. */
  hit?: HitId | null;
  button?: number;
}

/** Pixels the pointer must travel before a press becomes a drag. */
export const DRAG_THRESHOLD_PX = 3;
/** How close (in screen pixels) a dragged centre must come to a centre line to snap to it. */
export const SNAP_TOLERANCE_PX = 6;
export const MIN_ZOOM = 0.05;
export const MAX_ZOOM = 40;

type Listener = (state: EditorState) => void;

export interface EditorOptions {
  readOnly?: boolean;
  grid?: GridId;
  units?: UnitSystem;
  /** Called once per history entry that changes the design (a drag reports once, when it ends). */
  onCommit?: (doc: StudioDoc) => void;
}

export class StudioEditor {
  private state: EditorState;
  private listeners = new Set<Listener>();
  private spaceHeld = false;
  private dragCount = 0;
  private quiet = false;
  private readonly onCommit?: (doc: StudioDoc) => void;

  constructor(doc: StudioDoc, options: EditorOptions = {}) {
    this.onCommit = options.onCommit;
    this.state = {
      doc,
      selection: null,
      history: H.emptyHistory(),
      readOnly: options.readOnly ?? false,
      grid: options.grid ?? 'mm1',
      units: options.units ?? 'mm',
      activeView: 'side',
      camera: { zoom: 1, x: 0, y: 0 },
      tool: { name: 'idle' },
      guides: [],
      docVersion: 0,
    };
  }

  getState = (): EditorState => this.state;

  subscribe = (fn: Listener): (() => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  private set(patch: Partial<EditorState>): void {
    this.state = { ...this.state, ...patch };
    for (const fn of this.listeners) fn(this.state);
  }

  get doc(): StudioDoc {
    return this.state.doc;
  }
  get selection(): Selection {
    return this.state.selection;
  }
  get canUndo(): boolean {
    return this.state.history.undo.length > 0;
  }
  get canRedo(): boolean {
    return this.state.history.redo.length > 0;
  }

  // ---- settings -------------------------------------------------------------------------------
  setReadOnly(readOnly: boolean): void {
    if (readOnly !== this.state.readOnly) this.set({ readOnly, tool: { name: 'idle' }, guides: [] });
  }
  setGrid(grid: GridId): void {
    this.set({ grid });
  }
  setUnits(units: UnitSystem): void {
    this.set({ units });
  }
  setActiveView(activeView: ViewName): void {
    if (activeView !== this.state.activeView) this.set({ activeView });
  }

  // ---- commands -------------------------------------------------------------------------------
  /** Runs a command; returns false when it is refused (read-only) or does not apply. */
  run<A>(command: Command<A>, args: A): boolean {
    if (command.edits && this.state.readOnly) return false;
    const { doc, selection, history } = this.state;
    const result = command.perform(doc, selection, args);
    if (!result) return false;
    if (result.history === 'skip' || result.doc === doc) {
      if (result.doc === doc && sameSelection(result.selection, selection)) return false;
      this.set({ doc: result.doc, selection: result.selection, docVersion: this.state.docVersion + (result.doc === doc ? 0 : 1) });
      return true;
    }
    const nextHistory = H.recordChange(history, doc, result.doc, selection, result.selection, result.history);
    this.set({ doc: result.doc, selection: result.selection, history: nextHistory, docVersion: this.state.docVersion + 1 });
    if (result.history === 'record' && !this.quiet) this.onCommit?.(result.doc);
    return true;
  }

  select(selection: Selection): boolean {
    return this.run(selectCommand, { selection });
  }
  addBrace(kind: 'shelf' | 'bar'): boolean {
    return this.run(addBraceCommand, { kind });
  }
  addOpening(kind: Parameters<typeof addOpeningCommand.perform>[2]['kind']): boolean {
    return this.run(addOpeningCommand, { kind });
  }
  deleteSelection(): boolean {
    return this.run(deleteSelectionCommand, {});
  }
  setField(path: ReadonlyArray<string | number>, value: unknown): boolean {
    return this.run(setFieldCommand, { path, value });
  }
  setOpeningFace(index: number, face: Parameters<typeof setOpeningFaceCommand.perform>[2]['face']): boolean {
    return this.run(setOpeningFaceCommand, { index, face });
  }
  moveSelection(coords: Partial<Record<Axis, number>>): boolean {
    return this.run(moveItemCommand, { coords, history: 'record' });
  }
  resizeBox(axis: Axis, sizeMm: number): boolean {
    return this.run(resizeBoxCommand, { axis, sizeMm, history: 'record' });
  }
  applyPortLength(indexes: readonly number[], lengthMm: number): boolean {
    return this.run(applyPortLengthCommand, { indexes, lengthMm });
  }

  /**
   * Takes a design from outside (the side form, a reload). Ignored when it is the document we already
   * hold. `history: false` replaces the document and clears the history (a reload after a conflict).
   */
  replaceDoc(doc: StudioDoc, opts: { history?: boolean } = {}): boolean {
    if (doc === this.state.doc) return false;
    if (opts.history === false) {
      this.set({ doc, selection: null, history: H.emptyHistory(), tool: { name: 'idle' }, guides: [], docVersion: this.state.docVersion + 1 });
      return true;
    }
    if (this.state.readOnly) {
      // Viewers still see the latest saved design; it is just not theirs to undo.
      this.set({ doc, docVersion: this.state.docVersion + 1 });
      return true;
    }
    // Not reported back through onCommit: the caller already has this design.
    this.quiet = true;
    try {
      return this.run(replaceDocCommand, { doc });
    } finally {
      this.quiet = false;
    }
  }

  undo(): boolean {
    return this.restore(H.undo);
  }

  redo(): boolean {
    return this.restore(H.redo);
  }

  private restore(step: typeof H.undo): boolean {
    if (this.state.readOnly || this.state.tool.name === 'dragging') return false;
    const r = step(this.state.history, this.state.doc);
    if (!r) return false;
    this.set({ doc: r.doc, selection: r.selection, history: r.history, docVersion: this.state.docVersion + 1 });
    this.onCommit?.(r.doc);
    return true;
  }

  /** Arrow-key nudge in the active view (or the first view where the selection can move that way). */
  nudge(dir: 'left' | 'right' | 'up' | 'down', large: boolean): boolean {
    const { doc, selection, grid, activeView } = this.state;
    const axes = movableAxes(doc, selection);
    if (axes.length === 0) return false;
    const pick = (v: ViewName) => (dir === 'left' || dir === 'right' ? VIEW_AXES[v].h : VIEW_AXES[v].v);
    const view = axes.includes(pick(activeView)) ? activeView : VIEWS.find((v) => axes.includes(pick(v)));
    if (!view) return false;
    const axis = pick(view);
    const step = nudgeStepMm(grid, large) * (dir === 'left' || dir === 'down' ? -1 : 1);
    const current = itemCoordMm(doc, selection, axis);
    if (current === null) return false;
    // Land on the grid: a nudge from an off-grid value goes to the next grid line in that direction.
    const target = grid === 'off' ? current + step : snapToGrid(current + step, grid);
    return this.run(nudgeCommand, { delta: { [axis]: target - current } });
  }

  // ---- camera ---------------------------------------------------------------------------------
  layout(): WorldLayout {
    return layoutViews(this.state.doc);
  }

  screenToWorld(p: Point): Point {
    const { zoom, x, y } = this.state.camera;
    return { x: (p.x - x) / zoom, y: (y - p.y) / zoom };
  }

  worldToScreen(p: Point): Point {
    const { zoom, x, y } = this.state.camera;
    return { x: x + p.x * zoom, y: y - p.y * zoom };
  }

  /** Which view's drawing (plus half the gap around it) contains a world point. */
  viewAt(world: Point, layout = this.layout()): ViewName | null {
    for (const v of VIEWS) {
      const l = layout.views[v];
      const pad = layout.gapMm / 2;
      if (world.x >= l.ox - pad && world.x <= l.ox + l.w + pad && world.y >= l.oy - pad && world.y <= l.oy + l.h + pad) return v;
    }
    return null;
  }

  fitToView(viewport: { width: number; height: number }, paddingPx = 24): void {
    const b = this.layout().bounds;
    const w = b.maxX - b.minX;
    const h = b.maxY - b.minY;
    const zoom = Math.min((viewport.width - 2 * paddingPx) / w, (viewport.height - 2 * paddingPx) / h);
    const z = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, zoom));
    const x = (viewport.width - w * z) / 2 - b.minX * z;
    const y = (viewport.height + h * z) / 2 + b.minY * z;
    this.set({ camera: { zoom: z, x, y } });
  }

  /** Zooms about a screen point (the wheel): the world point under it stays put. */
  zoomAt(screen: Point, factor: number): void {
    const { camera } = this.state;
    const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, camera.zoom * factor));
    const world = this.screenToWorld(screen);
    this.set({ camera: { zoom, x: screen.x - world.x * zoom, y: screen.y + world.y * zoom } });
  }

  panBy(dx: number, dy: number): void {
    const c = this.state.camera;
    this.set({ camera: { ...c, x: c.x + dx, y: c.y + dy } });
  }

  // ---- pointer: the drag tool -------------------------------------------------------------------
  pointerDown(input: PointerInput): void {
    const world = this.screenToWorld(input.screen);
    const view = this.viewAt(world);
    if (view) this.setActiveView(view);
    const panning = input.button === 1 || this.spaceHeld || !input.hit;
    if (panning) {
      if (input.hit == null && input.button !== 1 && !this.spaceHeld) this.select(null);
      this.set({ tool: { name: 'panning', downScreen: input.screen, startCamera: this.state.camera } });
      return;
    }
    const hit = input.hit!;
    const parsed = parseHit(hit);
    this.select(parsed.kind === 'edge' ? { kind: 'box' } : { kind: parsed.kind, index: parsed.index });
    this.set({ tool: { name: 'pointing', hit, view, downScreen: input.screen } });
  }

  pointerMove(input: PointerInput): void {
    const tool = this.state.tool;
    if (tool.name === 'panning') {
      const c = tool.startCamera;
      this.set({ camera: { ...c, x: c.x + input.screen.x - tool.downScreen.x, y: c.y + input.screen.y - tool.downScreen.y } });
      return;
    }
    if (tool.name === 'pointing') {
      const moved = Math.hypot(input.screen.x - tool.downScreen.x, input.screen.y - tool.downScreen.y);
      if (moved < DRAG_THRESHOLD_PX || !tool.hit || !tool.view || this.state.readOnly) return;
      this.startDrag(tool.hit, tool.view, tool.downScreen);
    }
    if (this.state.tool.name === 'dragging') this.dragTo(input.screen);
  }

  pointerUp(_input?: PointerInput): void {
    const tool = this.state.tool;
    if (tool.name === 'dragging') {
      const history = H.closeMark(this.state.history);
      this.set({ tool: { name: 'idle' }, guides: [], history });
      const top = history.undo[history.undo.length - 1];
      if (top && top.mark === tool.mark) this.onCommit?.(this.state.doc);
      return;
    }
    if (tool.name !== 'idle') this.set({ tool: { name: 'idle' } });
  }

  /** Escape during a drag puts everything back as it was before the drag. */
  cancel(): void {
    const tool = this.state.tool;
    if (tool.name === 'dragging') {
      const r = H.bailToMark(this.state.history, this.state.doc);
      if (r) this.set({ doc: r.doc, selection: r.selection, history: r.history, docVersion: this.state.docVersion + 1 });
      else this.set({ history: H.closeMark(this.state.history) });
      this.set({ tool: { name: 'idle' }, guides: [] });
      return;
    }
    if (tool.name !== 'idle') this.set({ tool: { name: 'idle' } });
  }

  private startDrag(hit: HitId, view: ViewName, downScreen: Point): void {
    const { doc, selection } = this.state;
    const parsed = parseHit(hit);
    const start: Partial<Record<Axis, number>> = {};
    if (parsed.kind === 'edge') start[parsed.axis] = outerSizeMm(doc, parsed.axis);
    else for (const a of movableAxes(doc, selection)) start[a] = itemCoordMm(doc, selection, a) ?? 0;
    const mark = `drag:${hit}:${++this.dragCount}`;
    this.set({
      tool: { name: 'dragging', hit, view, downScreen, start, layout: this.layout(), mark },
      history: H.openMark(this.state.history, mark),
    });
  }

  private dragTo(screen: Point): void {
    const tool = this.state.tool;
    if (tool.name !== 'dragging') return;
    const { zoom } = this.state.camera;
    const dh = (screen.x - tool.downScreen.x) / zoom;
    const dv = -(screen.y - tool.downScreen.y) / zoom;
    const { h, v } = VIEW_AXES[tool.view];
    const delta: Partial<Record<Axis, number>> = { [h]: dh, [v]: dv };
    const parsed = parseHit(tool.hit);
    const tolerance = SNAP_TOLERANCE_PX / zoom;
    if (parsed.kind === 'edge') {
      const raw = tool.start[parsed.axis]! + (delta[parsed.axis] ?? 0);
      this.run(resizeBoxCommand, { axis: parsed.axis, sizeMm: snapToGrid(raw, this.state.grid), history: 'merge' });
      return;
    }
    const coords: Partial<Record<Axis, number>> = {};
    const guides: Guide[] = [];
    for (const axis of Object.keys(tool.start) as Axis[]) {
      const d = delta[axis];
      if (d === undefined) continue; // not an axis of this view: keep it
      const snapped = snapCoordinate(tool.start[axis]! + d, this.state.grid, centreLinesMm(this.state.doc, axis, this.state.selection), tolerance);
      coords[axis] = snapped.valueMm;
      if (snapped.guideMm !== null) guides.push({ view: tool.view, axis, valueMm: snapped.guideMm });
    }
    this.run(moveItemCommand, { coords, history: 'merge' });
    this.set({ guides });
  }

  // ---- keyboard ---------------------------------------------------------------------------------
  /** Handles a key press; returns true when it was used (the caller then prevents the default). */
  keyDown(e: KeyInput): boolean {
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
    if (key === ' ') {
      this.spaceHeld = true;
      return true;
    }
    if (mod && key === 'z' && !e.shiftKey) return this.undo() || true;
    if ((mod && key === 'z' && e.shiftKey) || (mod && key === 'y')) return this.redo() || true;
    if (key === 'Escape') {
      if (this.state.tool.name === 'dragging') this.cancel();
      else this.select(null);
      return true;
    }
    if (mod || e.altKey) return false;
    if (key === 'Delete' || key === 'Backspace') return this.deleteSelection();
    const arrows: Record<string, 'left' | 'right' | 'up' | 'down'> = {
      ArrowLeft: 'left',
      ArrowRight: 'right',
      ArrowUp: 'up',
      ArrowDown: 'down',
    };
    const dir = arrows[key];
    if (dir) {
      if (this.state.readOnly || this.state.selection === null) return false;
      this.nudge(dir, !!e.shiftKey);
      return true;
    }
    return false;
  }

  keyUp(e: KeyInput): void {
    if (e.key === ' ') this.spaceHeld = false;
  }
}
