/**
 * Geometry rules a parsed design must meet before it can be planned (PRODUCT.md §3 "Errors"). Each
 * problem names its field path, as zod's issues do, e.g. ['braces', 1, 'position'].
 */
import type { Axis, Design, Opening } from '../schemas/design.schema.js';
import { FACE_COORDS } from '../schemas/design.schema.js';
import type { IssueLike } from '../errors.js';
import { AXIS_INDEX, FACE_NORMAL, cavitySize, makeFrame, panelThickness, type Frame } from './frame.js';
import { OTHER_AXES, cutoutBounds, openingCentre, openingFootprint, windowCutout } from './elements.js';

const fmt = (v: number) => `${Math.round(v * 100) / 100} mm`;
const AXIS_SIZE_NAME: Record<Axis, string> = { x: 'width', y: 'height', z: 'depth' };
const EPS = 1e-6;

/** Panel thicknesses against the outer sizes: a thickness of half an outer size or more cannot make a box. */
function checkThickness(design: Design): IssueLike[] {
  const issues: IssueLike[] = [];
  const t = design.material.thickness;
  const tf = design.baffleThickness ?? t;
  const { width: W, height: H, depth: D } = design.outer;
  for (const [size, name] of [[W, 'width'], [H, 'height'], [D, 'depth']] as const) {
    if (2 * t >= size) {
      issues.push({ path: ['material', 'thickness'], message: `panel thickness ${fmt(t)} is half the outer ${name} (${fmt(size)}) or more` });
      return issues;
    }
  }
  if (design.baffleThickness !== undefined && 2 * tf >= D) {
    issues.push({ path: ['baffleThickness'], message: `baffle thickness ${fmt(tf)} is half the outer depth (${fmt(D)}) or more` });
  } else if (tf + t >= D) {
    issues.push({ path: ['baffleThickness'], message: `baffle ${fmt(tf)} and back ${fmt(t)} leave no depth inside the outer depth ${fmt(D)}` });
  }
  return issues;
}

function checkBraces(design: Design, frame: Frame): IssueLike[] {
  const issues: IssueLike[] = [];
  design.braces.forEach((b, i) => {
    if (b.type === 'shelf') {
      const ai = AXIS_INDEX[b.axis];
      const lo = frame.cavity.min[ai];
      const hi = frame.cavity.max[ai];
      if (b.thickness >= hi - lo) {
        issues.push({ path: ['braces', i, 'thickness'], message: `brace thickness ${fmt(b.thickness)} fills the whole cavity along ${b.axis} (${fmt(hi - lo)})` });
        return;
      }
      if (b.position - b.thickness / 2 < lo - EPS || b.position + b.thickness / 2 > hi + EPS) {
        issues.push({
          path: ['braces', i, 'position'],
          message: `a ${fmt(b.thickness)} brace at ${b.axis} = ${fmt(b.position)} is outside the cavity, which runs from ${fmt(lo)} to ${fmt(hi)} along ${b.axis}; place its centre between ${fmt(lo + b.thickness / 2)} and ${fmt(hi - b.thickness / 2)}`,
        });
        return;
      }
      const [ua, va] = OTHER_AXES[b.axis];
      const size = cavitySize(frame);
      const wu = size[AXIS_INDEX[ua]];
      const wv = size[AXIS_INDEX[va]];
      b.windows.forEach((w, j) => {
        const r = cutoutBounds(windowCutout(frame, b, w));
        if (r.minX < -EPS || r.maxX > wu + EPS) {
          issues.push({ path: ['braces', i, 'windows', j, 'u'], message: `window does not fit on the brace: along ${ua} it must lie between ${fmt(frame.cavity.min[AXIS_INDEX[ua]])} and ${fmt(frame.cavity.max[AXIS_INDEX[ua]])}` });
        } else if (r.minY < -EPS || r.maxY > wv + EPS) {
          issues.push({ path: ['braces', i, 'windows', j, 'v'], message: `window does not fit on the brace: along ${va} it must lie between ${fmt(frame.cavity.min[AXIS_INDEX[va]])} and ${fmt(frame.cavity.max[AXIS_INDEX[va]])}` });
        }
      });
    } else {
      OTHER_AXES[b.axis].forEach((a, k) => {
        const ai = AXIS_INDEX[a];
        const lo = frame.cavity.min[ai];
        const hi = frame.cavity.max[ai];
        const half = b.section[k]! / 2;
        if (b.section[k]! > hi - lo + EPS) {
          issues.push({ path: ['braces', i, 'section', k], message: `bar section ${fmt(b.section[k]!)} is larger than the cavity along ${a} (${fmt(hi - lo)})` });
        } else if (b.at[k]! - half < lo - EPS || b.at[k]! + half > hi + EPS) {
          issues.push({
            path: ['braces', i, 'at', k],
            message: `bar at ${a} = ${fmt(b.at[k]!)} is outside the cavity, which runs from ${fmt(lo)} to ${fmt(hi)} along ${a}`,
          });
        }
      });
    }
  });
  return issues;
}

function checkOpening(design: Design, frame: Frame, o: Opening, i: number): IssueLike[] {
  const issues: IssueLike[] = [];
  const [uField, vField] = FACE_COORDS[o.face];
  const fp = openingFootprint(frame, o);
  const [cu, cv] = openingCentre(frame, o);
  const view = { u: uField, v: vField };
  const uSize = design.outer[AXIS_SIZE_NAME[view.u] as 'width' | 'height' | 'depth'];
  const vSize = design.outer[AXIS_SIZE_NAME[view.v] as 'width' | 'height' | 'depth'];
  if (fp.minX < -EPS || fp.maxX > uSize + EPS) {
    issues.push({ path: ['openings', i, uField], message: `the ${o.type} cut-out (${fmt(fp.maxX - fp.minX)} across) does not fit on the ${o.face} face at ${uField} = ${fmt(o[uField] ?? cu)}; the face is ${fmt(uSize)} along ${uField}` });
  }
  if (fp.minY < -EPS || fp.maxY > vSize + EPS) {
    issues.push({ path: ['openings', i, vField], message: `the ${o.type} cut-out (${fmt(fp.maxY - fp.minY)} across) does not fit on the ${o.face} face at ${vField} = ${fmt(o[vField] ?? cv)}; the face is ${fmt(vSize)} along ${vField}` });
  }
  if (o.type === 'port') {
    const tp = panelThickness(frame, o.face);
    const n = FACE_NORMAL[o.face];
    const depthInside = cavitySize(frame)[AXIS_INDEX[n.axis]];
    if (o.length < tp - EPS) {
      issues.push({ path: ['openings', i, 'length'], message: `port length ${fmt(o.length)} is shorter than the ${o.face} panel it passes through (${fmt(tp)})` });
    } else if (o.length - tp > depthInside + EPS) {
      issues.push({ path: ['openings', i, 'length'], message: `port length ${fmt(o.length)} runs through the box: at most ${fmt(tp + depthInside)} fits from the ${o.face} face` });
    }
  }
  if (o.type === 'driver' && o.rebate && o.rebate.diameter <= o.diameter) {
    issues.push({ path: ['openings', i, 'rebate', 'diameter'], message: `rebate diameter ${fmt(o.rebate.diameter)} must be larger than the cut-out (${fmt(o.diameter)})` });
  }
  if (o.type === 'driver' && o.rebate && o.rebate.depth >= panelThickness(frame, o.face)) {
    issues.push({ path: ['openings', i, 'rebate', 'depth'], message: `rebate depth ${fmt(o.rebate.depth)} must be less than the panel thickness (${fmt(panelThickness(frame, o.face))})` });
  }
  return issues;
}

function checkLining(design: Design, frame: Frame): IssueLike[] {
  const lining = design.lining;
  if (!lining) return [];
  const size = cavitySize(frame);
  const smallest = Math.min(...size);
  if (lining.thickness > smallest / 2 + EPS) {
    return [{ path: ['lining', 'thickness'], message: `lining ${fmt(lining.thickness)} is thicker than half the smallest internal size (${fmt(smallest)})` }];
  }
  return [];
}

/** Every geometry problem of a parsed design; empty when it can be planned. */
export function checkDesignGeometry(design: Design): IssueLike[] {
  const thickness = checkThickness(design);
  if (thickness.length > 0) return thickness;
  const frame = makeFrame(design);
  return [
    ...checkBraces(design, frame),
    ...design.openings.flatMap((o, i) => checkOpening(design, frame, o, i)),
    ...checkLining(design, frame),
  ];
}
