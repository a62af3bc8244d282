/** Drives the headless editor with screen-pixel pointer events, like a user on the canvas. */
import type { Axis } from '../../../shared/schemas/design.schema';
import { StudioEditor, type EditorOptions } from '../../../src/features/studio/model/editor';
import type { StudioDoc, ViewName } from '../../../src/features/studio/model/types';
import { VIEW_AXES, type HitId } from '../../../src/features/studio/model/views';

export function makeEditor(doc: StudioDoc, options: EditorOptions = {}): StudioEditor {
  const ed = new StudioEditor(doc, options);
  ed.fitToView({ width: 1200, height: 800 });
  return ed;
}

/** Screen point of a box coordinate pair in one view. */
export function screenOf(ed: StudioEditor, view: ViewName, coords: Partial<Record<Axis, number>>) {
  const l = ed.layout().views[view];
  const { h, v } = VIEW_AXES[view];
  return ed.worldToScreen({ x: l.ox + (coords[h] ?? 0), y: l.oy + (coords[v] ?? 0) });
}

/** Presses on a hit, moves by (dhMm, dvMm) of the view's axes in a few steps, releases. */
export function drag(ed: StudioEditor, view: ViewName, hit: HitId, at: Partial<Record<Axis, number>>, dhMm: number, dvMm: number, steps = 5) {
  const start = screenOf(ed, view, at);
  const zoom = ed.getState().camera.zoom;
  ed.pointerDown({ screen: start, hit, button: 0 });
  for (let i = 1; i <= steps; i++) {
    ed.pointerMove({ screen: { x: start.x + (dhMm * zoom * i) / steps, y: start.y - (dvMm * zoom * i) / steps } });
  }
  ed.pointerUp();
}
