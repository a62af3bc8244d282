/**
 * Panels to cut: the six faces (sizes from the joinery precedence), shelf braces (panels with their
 * windows as holes) and bar braces (strips from the same sheet). Every opening is a hole in its panel,
 * in the panel's own coordinates (see frame.ts for the view of each face). Rectangular holes are given by
 * their centre, like round ones.
 */
import type { Design, Face, Opening } from '../schemas/design.schema.js';
import type { PanelHole, PanelPlan, Warning } from '../schemas/plan.types.js';
import { AXIS_INDEX, cavitySize, panelFaceRect, panelThickness, type Frame } from './frame.js';
import { OTHER_AXES, openingCentre, screwHoleCentres, throughCutout, windowCutout, type Cutout } from './elements.js';

/** Names a builder understands, in the order panels are listed. */
export const FACE_PANEL_NAMES: Record<Face, string> = {
  front: 'Front (baffle)',
  back: 'Back',
  left: 'Left side',
  right: 'Right side',
  top: 'Top',
  bottom: 'Bottom',
};
const FACE_ORDER: Face[] = ['front', 'back', 'left', 'right', 'top', 'bottom'];

/** Round lengths in the plan to 1/1000 mm so the JSON stays readable. */
export function roundMm(v: number): number {
  return Math.round(v * 1000) / 1000;
}

function holeFrom(c: Cutout, dx: number, dy: number, source: string, ref: string): PanelHole {
  if (c.shape === 'round') {
    return { shape: 'round', x: roundMm(c.cx - dx), y: roundMm(c.cy - dy), diameter: roundMm(c.diameter), operation: 'through', source, ref };
  }
  return { shape: 'rect', x: roundMm(c.cx - dx), y: roundMm(c.cy - dy), width: roundMm(c.width), height: roundMm(c.height), operation: 'through', source, ref };
}

function openingHoles(frame: Frame, o: Opening, i: number, dx: number, dy: number): PanelHole[] {
  const ref = `openings[${i}]`;
  const holes: PanelHole[] = [holeFrom(throughCutout(frame, o), dx, dy, o.type, ref)];
  if (o.type === 'driver') {
    const [cx, cy] = openingCentre(frame, o);
    if (o.rebate) {
      holes.push({ shape: 'round', x: roundMm(cx - dx), y: roundMm(cy - dy), diameter: roundMm(o.rebate.diameter), operation: 'rebate', depth: o.rebate.depth, source: 'driver', ref });
    }
    if (o.screwHoles) {
      for (const [sx, sy] of screwHoleCentres(cx, cy, o.screwHoles.count, o.screwHoles.circleDiameter)) {
        holes.push({ shape: 'round', x: roundMm(sx - dx), y: roundMm(sy - dy), diameter: o.screwHoles.holeDiameter, operation: 'through', source: 'screw', ref });
      }
    }
  }
  return holes;
}

export interface PanelsResult {
  panels: PanelPlan[];
  warnings: Warning[];
}

export function planPanels(design: Design, frame: Frame): PanelsResult {
  const panels: PanelPlan[] = [];
  const warnings: Warning[] = [];
  for (const face of FACE_ORDER) {
    const r = panelFaceRect(frame, face);
    const holes: PanelHole[] = [];
    design.openings.forEach((o, i) => {
      if (o.face === face) holes.push(...openingHoles(frame, o, i, r.minX, r.minY));
    });
    panels.push({
      name: FACE_PANEL_NAMES[face],
      role: face,
      width: roundMm(r.maxX - r.minX),
      height: roundMm(r.maxY - r.minY),
      thickness: panelThickness(frame, face),
      quantity: 1,
      // Grain along the height on front, back and sides; along the width on top and bottom.
      grain: face === 'top' || face === 'bottom' ? 'width' : 'height',
      holes,
    });
  }
  const size = cavitySize(frame);
  let shelf = 0;
  let bar = 0;
  design.braces.forEach((b, i) => {
    if (b.type === 'shelf') {
      shelf += 1;
      const [ua, va] = OTHER_AXES[b.axis];
      panels.push({
        name: `Shelf brace ${shelf}`,
        role: 'brace',
        width: roundMm(size[AXIS_INDEX[ua]]),
        height: roundMm(size[AXIS_INDEX[va]]),
        thickness: b.thickness,
        quantity: 1,
        grain: 'none',
        holes: b.windows.map((w, j) => holeFrom(windowCutout(frame, b, w), 0, 0, 'window', `braces[${i}].windows[${j}]`)),
      });
    } else {
      bar += 1;
      const t = frame.thickness;
      const across = Math.min(...b.section);
      const wide = Math.max(...b.section);
      // A bar is cut as strips of the sheet: `wide` across, laminated to reach `across` when it is thicker than the sheet.
      const layers = Math.max(1, Math.ceil(across / t - 1e-6));
      if (Math.abs(layers * t - across) > 0.5) {
        warnings.push({
          code: 'bar_section',
          message: `Bar brace ${bar}: a ${roundMm(b.section[0])} × ${roundMm(b.section[1])} mm section is not a whole number of ${t} mm sheets; it is listed as ${layers} strip(s) ${roundMm(wide)} mm wide`,
          field: `braces[${i}].section`,
        });
      }
      panels.push({
        name: `Bar brace ${bar}`,
        role: 'bar',
        width: roundMm(size[AXIS_INDEX[b.axis]]),
        height: roundMm(wide),
        thickness: t,
        quantity: layers,
        grain: 'none',
        holes: [],
      });
    }
  });
  return { panels, warnings };
}
