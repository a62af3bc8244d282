/**
 * DXF of every panel with its holes, for CNC, built as a makerjs model and written by
 * makerjs.exporter.toDXF: millimetres ($INSUNITS 4), closed outlines as closed POLYLINEs, round holes
 * as CIRCLEs, one layer per operation:
 *   OUTLINE  the panel's outside edge (cut through)
 *   HOLES    holes cut through the panel
 *   REBATE   pockets routed to a depth (the depth is written in the label)
 *   LABELS   text: panel name, size, quantity, rebate depths (not for cutting)
 * Each distinct panel appears once, laid out in rows with a gap; its label says how many to cut
 * (quantity per cabinet × cabinets). Labels are plain ASCII, which every DXF reader takes.
 */
import makerjs from 'makerjs';
import type { PanelHole, PanelPlan } from '../schemas/plan.types.js';
import type { BuildCabinet } from './build.js';
import { fmtMm } from './stencil-items.js';

export const DXF_LAYERS = { outline: 'OUTLINE', holes: 'HOLES', rebate: 'REBATE', labels: 'LABELS' } as const;

/** AutoCAD colour index per layer: 7 white/black, 1 red, 5 blue, 3 green. */
const LAYER_OPTIONS = {
  [DXF_LAYERS.outline]: { color: 7 },
  [DXF_LAYERS.holes]: { color: 1 },
  [DXF_LAYERS.rebate]: { color: 5 },
  [DXF_LAYERS.labels]: { color: 3, fontSize: 8 },
};

export interface DxfOptions {
  /** Space between panels (mm). */
  gapMm?: number;
  /** Start a new row when a row would be wider than this (mm). */
  rowWidthMm?: number;
}

function holeLayer(h: PanelHole): string {
  return h.operation === 'rebate' ? DXF_LAYERS.rebate : DXF_LAYERS.holes;
}

/** Height of one label line (mm). */
const LABEL_LINE_MM = 12;

function caption(text: string, widthMm: number, line: number): makerjs.IModel {
  const m: makerjs.IModel = { layer: DXF_LAYERS.labels };
  const y = -LABEL_LINE_MM * (line + 1);
  makerjs.model.addCaption(m, text, [0, y], [widthMm, y]);
  return m;
}

/** Label lines under a panel: the lines given, then one per rebate with its depth. */
function labelLines(panel: PanelPlan, lines: readonly string[]): string[] {
  const rebates = panel.holes
    .filter((h) => h.operation === 'rebate')
    .map((h) => `rebate ${h.shape === 'round' ? `dia ${fmtMm(h.diameter)}` : `${fmtMm(h.width)} x ${fmtMm(h.height)}`} depth ${fmtMm(h.depth ?? 0)}`);
  return [...lines, ...rebates];
}

/** One panel as a makerjs model in its own coordinates (origin lower-left, mm), labels below it. */
export function panelModel(panel: PanelPlan, lines: readonly string[]): makerjs.IModel {
  const outline: makerjs.IModel = new makerjs.models.Rectangle(panel.width, panel.height);
  outline.layer = DXF_LAYERS.outline;
  const paths: Record<string, makerjs.IPath> = {};
  const models: Record<string, makerjs.IModel> = { outline };
  panel.holes.forEach((h, i) => {
    if (h.shape === 'round') {
      const c: makerjs.IPath = new makerjs.paths.Circle([h.x, h.y], h.diameter / 2);
      c.layer = holeLayer(h);
      paths[`hole${i}`] = c;
    } else {
      const r: makerjs.IModel = new makerjs.models.Rectangle(h.width, h.height);
      r.origin = [h.x - h.width / 2, h.y - h.height / 2];
      r.layer = holeLayer(h);
      models[`hole${i}`] = r;
    }
  });
  labelLines(panel, lines).forEach((t, i) => {
    models[`label${i}`] = caption(t, panel.width, i);
  });
  return { paths, models };
}

/** Every distinct panel of the build, with its holes, laid out in rows. */
export function buildModel(cabinets: readonly BuildCabinet[], options: DxfOptions = {}): makerjs.IModel {
  const gap = options.gapMm ?? 60;
  const rowWidth = options.rowWidthMm ?? 2500;
  const models: Record<string, makerjs.IModel> = {};
  let x = 0;
  let y = 0;
  let rowDepth = 0;
  let n = 0;
  for (const cabinet of cabinets) {
    for (const panel of cabinet.plan.panels) {
      if (x > 0 && x + panel.width > rowWidth) {
        x = 0;
        y -= rowDepth + gap;
        rowDepth = 0;
      }
      const lines = [cabinet.name, panel.name, `${fmtMm(panel.width)} x ${fmtMm(panel.height)} x ${fmtMm(panel.thickness)} mm - cut ${panel.quantity * cabinet.count}`];
      const m = panelModel(panel, lines);
      // Rows grow downwards; each panel's top edge sits on the row's top line.
      m.origin = [x, y - panel.height];
      models[`p${++n}`] = m;
      x += panel.width + gap;
      rowDepth = Math.max(rowDepth, panel.height + LABEL_LINE_MM * (labelLines(panel, lines).length + 1));
    }
  }
  return { models, units: makerjs.unitType.Millimeter };
}

/** The DXF text of the build's panels. */
export function panelsDxf(cabinets: readonly BuildCabinet[], options: DxfOptions = {}): string {
  return makerjs.exporter.toDXF(buildModel(cabinets, options), {
    units: makerjs.unitType.Millimeter,
    usePOLYLINE: true,
    layerOptions: LAYER_OPTIONS,
    fontSize: 8,
  });
}
