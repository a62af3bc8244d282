/** The panels DXF, parsed back with dxf-parser (a general-purpose DXF parser from npm). */
import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { DXF_LAYERS, panelsDxf } from '../../../shared/render/dxf.js';
import type { PanelPlan } from '../../../shared/schemas/plan.types.js';
import { demoBuild } from './demo-build.js';
import { BOOKSHELF_CABINET } from './fixtures.js';

interface Vertex {
  x: number;
  y: number;
}
interface Entity {
  type: string;
  layer: string;
  shape?: boolean;
  vertices?: Vertex[];
  center?: Vertex;
  radius?: number;
  text?: string;
  startPoint?: Vertex;
}

function parse(dxf: string) {
  const parsed = new DxfParser().parseSync(dxf);
  if (!parsed) throw new Error('dxf-parser returned nothing');
  return { header: parsed.header as Record<string, unknown>, layers: Object.keys(parsed.tables.layer.layers), entities: parsed.entities as unknown as Entity[] };
}

const boundsOf = (vs: Vertex[]) => ({
  minX: Math.min(...vs.map((v) => v.x)),
  maxX: Math.max(...vs.map((v) => v.x)),
  minY: Math.min(...vs.map((v) => v.y)),
  maxY: Math.max(...vs.map((v) => v.y)),
});

/** Each outline with the panel named by the label lines under it (cabinet, panel name). */
function outlinesByLabel(entities: Entity[]) {
  const texts = entities.filter((e) => e.type === 'TEXT');
  return entities
    .filter((e) => e.layer === DXF_LAYERS.outline)
    .map((e) => {
      const b = boundsOf(e.vertices!);
      const below = texts
        .filter((t) => Math.abs(t.startPoint!.x - (b.minX + b.maxX) / 2) < 1e-6 && t.startPoint!.y < b.minY && t.startPoint!.y > b.minY - 100)
        .sort((p, q) => q.startPoint!.y - p.startPoint!.y)
        .map((t) => t.text!);
      return { entity: e, bounds: b, label: below };
    });
}

function checkPanel(entities: Entity[], outline: ReturnType<typeof outlinesByLabel>[number], panel: PanelPlan) {
  const { bounds: b } = outline;
  expect(b.maxX - b.minX).toBeCloseTo(panel.width, 6);
  expect(b.maxY - b.minY).toBeCloseTo(panel.height, 6);
  const inside = (v: Vertex) => v.x > b.minX && v.x < b.maxX && v.y > b.minY && v.y < b.maxY;
  const key = (layer: string, x: number, y: number, d: number) => `${layer} ${(x).toFixed(3)} ${(y).toFixed(3)} ${d.toFixed(3)}`;
  const drawnRound = entities
    .filter((e) => e.type === 'CIRCLE' && inside(e.center!))
    .map((e) => key(e.layer, e.center!.x - b.minX, e.center!.y - b.minY, 2 * e.radius!))
    .sort();
  const plannedRound = panel.holes
    .filter((h) => h.shape === 'round')
    .map((h) => key(h.operation === 'rebate' ? DXF_LAYERS.rebate : DXF_LAYERS.holes, h.x, h.y, h.shape === 'round' ? h.diameter : 0))
    .sort();
  expect(drawnRound).toEqual(plannedRound);
  const drawnRect = entities
    .filter((e) => e.type === 'POLYLINE' && e.layer !== DXF_LAYERS.outline && e.vertices!.every(inside))
    .map((e) => {
      const r = boundsOf(e.vertices!);
      expect(e.shape).toBe(true);
      return `${e.layer} ${((r.minX + r.maxX) / 2 - b.minX).toFixed(3)} ${((r.minY + r.maxY) / 2 - b.minY).toFixed(3)} ${(r.maxX - r.minX).toFixed(3)}x${(r.maxY - r.minY).toFixed(3)}`;
    })
    .sort();
  const plannedRect = panel.holes
    .flatMap((h) => (h.shape === 'rect' ? [`${h.operation === 'rebate' ? DXF_LAYERS.rebate : DXF_LAYERS.holes} ${h.x.toFixed(3)} ${h.y.toFixed(3)} ${h.width.toFixed(3)}x${h.height.toFixed(3)}`] : []))
    .sort();
  expect(drawnRect).toEqual(plannedRect);
}

describe('panels DXF', () => {
  it('is in millimetres with one layer per operation', () => {
    const { header, layers } = parse(panelsDxf([BOOKSHELF_CABINET]));
    // $INSUNITS 4 = millimetres (AutoCAD DXF reference, header variables; from memory).
    expect(header.$INSUNITS).toBe(4);
    expect(layers.sort()).toEqual(['HOLES', 'LABELS', 'OUTLINE', 'REBATE']);
  });

  it('draws every outline as a closed polyline (DXF group 70 flag 1) with four corners', () => {
    const { entities } = parse(panelsDxf(demoBuild()));
    const outlines = entities.filter((e) => e.layer === DXF_LAYERS.outline);
    expect(outlines.length).toBe(demoBuild().reduce((n, c) => n + c.plan.panels.length, 0));
    for (const o of outlines) {
      expect(o.type).toBe('POLYLINE');
      expect(o.shape).toBe(true);
      expect(o.vertices).toHaveLength(4);
    }
  });

  it('gives every demo panel its plan size and every hole its plan centre, diameter and operation', () => {
    const build = demoBuild();
    const { entities } = parse(panelsDxf(build));
    const outlines = outlinesByLabel(entities);
    let checked = 0;
    for (const cabinet of build) {
      for (const panel of cabinet.plan.panels) {
        const matches = outlines.filter((o) => o.label[0] === cabinet.name && o.label[1] === panel.name);
        expect(matches, `${cabinet.name} / ${panel.name}`).toHaveLength(1);
        expect(matches[0]!.label[2]).toBe(`${panel.width} x ${panel.height} x ${panel.thickness} mm - cut ${panel.quantity * cabinet.count}`);
        checkPanel(entities, matches[0]!, panel);
        checked++;
      }
    }
    // Bookshelf: six faces and one shelf brace; floorstander: six faces and two shelf braces (PRODUCT.md §9).
    expect(checked).toBe(15);
    // The demo woofer: cut-out Ø 118, rebate Ø 134 (shared/demo/designs.ts) — both on the baffle DXF.
    const circles = entities.filter((e) => e.type === 'CIRCLE');
    expect(circles.some((c) => c.layer === 'HOLES' && c.radius === 59)).toBe(true);
    expect(circles.some((c) => c.layer === 'REBATE' && c.radius === 67)).toBe(true);
    expect(entities.some((e) => e.type === 'TEXT' && e.text === 'rebate dia 134 depth 5')).toBe(true);
  });

  it('keeps panels apart: no two outlines overlap', () => {
    const { entities } = parse(panelsDxf(demoBuild()));
    const boxes = outlinesByLabel(entities).map((o) => o.bounds);
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        expect(a.maxX <= b.minX || b.maxX <= a.minX || a.maxY <= b.minY || b.maxY <= a.minY).toBe(true);
      }
    }
  });
});
