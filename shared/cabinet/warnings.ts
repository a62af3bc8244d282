/**
 * Warnings about a design that can be planned but is risky (PRODUCT.md §3). Never silent: each is a plan
 * warning with a code, a plain message and the field it is about.
 */
import type { Design, Face, ShelfBrace } from '../schemas/design.schema.js';
import type { Warning } from '../schemas/plan.types.js';
import { rectContains } from '../geometry/polygon.js';
import {
  AXIS_INDEX,
  FACE_NORMAL,
  boxesOverlap,
  cavityFaceRect,
  faceRectOf,
  panelFaceRect,
  type Box3,
  type Frame,
} from './frame.js';
import {
  OTHER_AXES,
  barBraceBox,
  cutoutBounds,
  cutoutContains,
  cutoutOverlapsRect,
  cutoutsOverlap,
  openingFootprint,
  portTube,
  shelfBraceBox,
  throughCutout,
  windowCutout,
  type Cutout,
  type PortTube,
} from './elements.js';
import { FACE_PANEL_NAMES } from './panels.js';

const mm = (v: number) => `${Math.round(v)} mm`;

function braceLabel(design: Design, i: number): string {
  const b = design.braces[i]!;
  const n = design.braces.slice(0, i + 1).filter((x) => x.type === b.type).length;
  return b.type === 'shelf' ? `shelf brace ${n}` : `bar brace ${n}`;
}

function braceBox(design: Design, frame: Frame, i: number): Box3 {
  const b = design.braces[i]!;
  return b.type === 'shelf' ? shelfBraceBox(frame, b) : barBraceBox(frame, b);
}

/** Braces that touch a face's inner surface, as rectangles in face coordinates. */
function bracesOnFace(design: Design, frame: Frame, face: Face): { i: number; rect: ReturnType<typeof faceRectOf> }[] {
  const n = FACE_NORMAL[face];
  const ni = AXIS_INDEX[n.axis];
  const wall = n.side === 'min' ? frame.cavity.min[ni] : frame.cavity.max[ni];
  const out: { i: number; rect: ReturnType<typeof faceRectOf> }[] = [];
  design.braces.forEach((_, i) => {
    const box = braceBox(design, frame, i);
    const touches = n.side === 'min' ? box.min[ni]! <= wall + 1e-6 : box.max[ni]! >= wall - 1e-6;
    if (touches) out.push({ i, rect: faceRectOf(frame, face, box) });
  });
  return out;
}

export function geometryWarnings(design: Design, frame: Frame): Warning[] {
  const warnings: Warning[] = [];

  // Cut-outs crossing a panel edge (into an adjoining panel or off the panel) or a brace.
  design.openings.forEach((o, i) => {
    const cut = throughCutout(frame, o);
    const cavity = cavityFaceRect(frame, o.face);
    const panel = panelFaceRect(frame, o.face);
    const faceName = FACE_PANEL_NAMES[o.face].toLowerCase();
    if (!rectContains(cavity, cutoutBounds(cut)) || !rectContains(panel, openingFootprint(frame, o))) {
      warnings.push({
        code: 'cutout_crosses_edge',
        message: `The ${o.type} cut-out at openings[${i}] crosses the edge of the ${faceName} panel or runs into an adjoining panel`,
        field: `openings[${i}]`,
      });
    }
    for (const { i: bi, rect } of bracesOnFace(design, frame, o.face)) {
      if (cutoutOverlapsRect(cut, rect)) {
        warnings.push({
          code: 'cutout_crosses_brace',
          message: `The ${o.type} cut-out at openings[${i}] crosses ${braceLabel(design, bi)} behind the ${faceName} panel`,
          field: `openings[${i}]`,
        });
      }
    }
  });

  // Cut-outs overlapping each other on the same face.
  for (let i = 0; i < design.openings.length; i++) {
    for (let j = i + 1; j < design.openings.length; j++) {
      const a = design.openings[i]!;
      const b = design.openings[j]!;
      if (a.face === b.face && cutoutsOverlap(throughCutout(frame, a), throughCutout(frame, b))) {
        warnings.push({ code: 'openings_overlap', message: `openings[${i}] and openings[${j}] overlap on the ${a.face} face`, field: `openings[${j}]` });
      }
    }
  }

  // Port tubes: crossing braces, and room in front of the inner end (common practice: at least one port diameter).
  design.openings.forEach((o, i) => {
    if (o.type !== 'port') return;
    const tube = portTube(frame, o);
    const ai = AXIS_INDEX[tube.axis];
    design.braces.forEach((b, bi) => {
      if (b.type === 'shelf' && b.axis === tube.axis && passesThroughWindow(frame, b, tube)) return;
      if (boxesOverlap(tube.insideBox, braceBox(design, frame, bi))) {
        warnings.push({ code: 'port_crosses_brace', message: `The port tube at openings[${i}] crosses ${braceLabel(design, bi)}`, field: `openings[${i}].length` });
      }
    });
    const d = tube.innerDiameterMm;
    const wall = tube.direction > 0 ? frame.cavity.max[ai] : frame.cavity.min[ai];
    let clearance = (wall - tube.innerEnd) * tube.direction;
    let what = 'the opposite wall';
    // Anything ahead of the mouth within the tube's footprint.
    const ahead: Box3 = { min: [...tube.box.min], max: [...tube.box.max] };
    if (tube.direction > 0) {
      ahead.min[ai] = tube.innerEnd;
      ahead.max[ai] = wall;
    } else {
      ahead.min[ai] = wall;
      ahead.max[ai] = tube.innerEnd;
    }
    design.braces.forEach((_, bi) => {
      const box = braceBox(design, frame, bi);
      if (!boxesOverlap(box, { min: [...ahead.min], max: [...ahead.max] }) && !touchesAhead(box, ahead, ai, tube.direction, tube.innerEnd)) return;
      const gap = tube.direction > 0 ? box.min[ai]! - tube.innerEnd : tube.innerEnd - box.max[ai]!;
      if (gap >= -1e-6 && gap < clearance) {
        clearance = gap;
        what = braceLabel(design, bi);
      }
    });
    if (clearance < d - 1e-6) {
      warnings.push({
        code: 'port_end_too_close',
        message: `The inner end of the port at openings[${i}] is ${mm(clearance)} from ${what}; leave at least one port diameter (${mm(d)}) clear (common practice)`,
        field: `openings[${i}].length`,
      });
    }
  });

  // Shelf braces crossing each other or bars.
  for (let i = 0; i < design.braces.length; i++) {
    for (let j = i + 1; j < design.braces.length; j++) {
      if (boxesOverlap(braceBox(design, frame, i), braceBox(design, frame, j))) {
        warnings.push({
          code: 'braces_cross',
          message: `${capital(braceLabel(design, i))} and ${braceLabel(design, j)} cross; they need a joint (halving or notch) where they meet`,
          field: `braces[${j}]`,
        });
      }
    }
  }

  // A shelf brace parallel to a lined face, inside that face's lining layer.
  if (design.lining) {
    const f = design.lining.thickness;
    for (const face of new Set(design.lining.faces)) {
      const n = FACE_NORMAL[face];
      const ni = AXIS_INDEX[n.axis];
      design.braces.forEach((b, bi) => {
        if (b.type !== 'shelf' || AXIS_INDEX[b.axis] !== ni) return;
        const box = shelfBraceBox(frame, b);
        const inLayer = n.side === 'min' ? box.min[ni]! < frame.cavity.min[ni] + f : box.max[ni]! > frame.cavity.max[ni] - f;
        if (inLayer) {
          warnings.push({ code: 'brace_in_lining', message: `${capital(braceLabel(design, bi))} sits within the ${face} lining layer; the lining there will not fit`, field: `braces[${bi}].position` });
        }
      });
    }
  }
  return warnings;
}

/** A tube running through a shelf brace across its axis inside one of the brace's windows. */
function passesThroughWindow(frame: Frame, brace: ShelfBrace, tube: PortTube): boolean {
  const [ua, va] = OTHER_AXES[brace.axis];
  const ui = AXIS_INDEX[ua];
  const vi = AXIS_INDEX[va];
  const cx = (tube.box.min[ui]! + tube.box.max[ui]!) / 2 - frame.cavity.min[ui]!;
  const cy = (tube.box.min[vi]! + tube.box.max[vi]!) / 2 - frame.cavity.min[vi]!;
  const w = tube.box.max[ui]! - tube.box.min[ui]!;
  const h = tube.box.max[vi]! - tube.box.min[vi]!;
  const footprint: Cutout = tube.shape === 'round' ? { shape: 'round', cx, cy, diameter: w } : { shape: 'rect', cx, cy, width: w, height: h };
  return brace.windows.some((win) => cutoutContains(windowCutout(frame, brace, win), footprint));
}

function touchesAhead(box: Box3, ahead: Box3, ai: number, direction: 1 | -1, innerEnd: number): boolean {
  // A brace face exactly at the mouth counts as ahead (zero clearance).
  for (let k = 0; k < 3; k++) {
    if (k === ai) continue;
    if (!(box.min[k]! < ahead.max[k]! && ahead.min[k]! < box.max[k]!)) return false;
  }
  return direction > 0 ? Math.abs(box.min[ai]! - innerEnd) < 1e-6 : Math.abs(box.max[ai]! - innerEnd) < 1e-6;
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/**
 * Panels larger than every sheet in stock (PRODUCT.md §3; for the cut plan, which knows the stock). A panel
 * fits a sheet when it fits as it is or turned by 90° (grain is the nesting's concern).
 */
export function panelsLargerThanStock(
  panels: ReadonlyArray<{ name: string; width: number; height: number }>,
  sheets: ReadonlyArray<{ width: number; height: number }>,
): Warning[] {
  const out: Warning[] = [];
  for (const p of panels) {
    const fits = sheets.some((s) => (p.width <= s.width && p.height <= s.height) || (p.width <= s.height && p.height <= s.width));
    if (!fits) {
      out.push({ code: 'panel_larger_than_stock', message: `${p.name} (${mm(p.width)} × ${mm(p.height)}) is larger than every sheet in stock`, field: p.name });
    }
  }
  return out;
}
