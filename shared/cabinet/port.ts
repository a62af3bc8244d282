/**
 * Port tuning of the plan: Helmholtz resonance of the net volume with every port (acoustics/helmholtz.ts),
 * the common length that reaches a target tuning (the net volume shrinks as the tubes grow, so it is
 * solved with the tube volume included), and the peak air speed.
 */
import type { Design, PortOpening } from '../schemas/design.schema.js';
import type { PortPlan, Warning } from '../schemas/plan.types.js';
import { speedOfSoundMs } from '../acoustics/air.js';
import {
  DEFAULT_END_CORRECTION,
  helmholtzHz,
  roundPort,
  slotPort,
  type EndCorrectionRule,
  type PortAcoustic,
} from '../acoustics/helmholtz.js';
import { PORT_SPEED_FREQUENCY_RATIO, audiblePortSpeedLimitMs, peakPortAirSpeedMs } from '../acoustics/port-velocity.js';
import { AXIS_INDEX, cavitySize, type Frame } from './frame.js';
import { portTube } from './elements.js';

const MM = 1e-3;

export interface PortOptions {
  endCorrection?: EndCorrectionRule;
}

function acousticOf(p: PortOpening, lengthMm: number, rule: EndCorrectionRule): PortAcoustic {
  return p.shape === 'slot'
    ? slotPort((p.width ?? 0) * MM, (p.height ?? 0) * MM, lengthMm * MM, rule)
    : roundPort((p.diameter ?? 0) * MM, lengthMm * MM, rule);
}

export interface PortResult {
  port: PortPlan | null;
  warnings: Warning[];
}

/**
 * @param netLitres net volume with the ports as designed
 * @param portLitres the ports' share of the gross volume as designed (added back when lengths change)
 */
export function planPort(design: Design, frame: Frame, netLitres: number, portLitres: number, options: PortOptions = {}): PortResult {
  const rule = options.endCorrection ?? DEFAULT_END_CORRECTION;
  const ports = design.openings.map((o, i) => ({ o, i })).filter((e): e is { o: PortOpening; i: number } => e.o.type === 'port');
  if (ports.length === 0) return { port: null, warnings: [] };
  const warnings: Warning[] = [];
  if (netLitres <= 0) {
    warnings.push({ code: 'no_net_volume', message: 'Braces, ports, drivers and lining leave no air in the box; the port tuning cannot be computed', field: 'outer' });
    return { port: null, warnings };
  }
  const c = speedOfSoundMs(design.airTemperatureC);
  const acoustics = ports.map(({ o }) => acousticOf(o, o.length, rule));
  const volumeM3 = netLitres / 1000;
  const tuningHz = helmholtzHz(volumeM3, acoustics, c);
  const areaM2 = acoustics.reduce((s, a) => s + a.areaM2, 0);
  const conductance = acoustics.reduce((s, a) => s + a.areaM2 / (a.lengthM + a.endCorrectionM), 0);
  // One port: its own effective length; several: the one length that gives the same total S/Leff.
  const effectiveLengthMm = areaM2 / conductance / MM;
  const plan: PortPlan = { tuningHz, effectiveLengthMm, areaMm2: areaM2 / (MM * MM), speedOfSoundMs: c };

  const target = ports.find(({ o }) => o.targetHz !== undefined);
  if (target?.o.targetHz !== undefined) {
    plan.targetHz = target.o.targetHz;
    const tubes = ports.map(({ o }) => portTube(frame, o));
    const size = cavitySize(frame);
    const minLen = Math.max(...tubes.map((t) => t.panelThicknessMm));
    const maxLen = Math.min(...tubes.map((t) => t.panelThicknessMm + size[AXIS_INDEX[t.axis]]));
    const netWithoutPortsM3 = (netLitres + portLitres) / 1000;
    const fbAt = (lenMm: number): number => {
      let tubeMm3 = 0;
      for (const t of tubes) tubeMm3 += t.outerAreaMm2 * Math.max(0, lenMm - t.panelThicknessMm);
      const v = netWithoutPortsM3 - tubeMm3 * 1e-9;
      if (v <= 0) return Infinity;
      return helmholtzHz(v, ports.map(({ o }) => acousticOf(o, lenMm, rule)), c);
    };
    const found = solveDecreasing(fbAt, target.o.targetHz, minLen, maxLen);
    if (found.kind === 'ok') plan.lengthForTargetMm = found.lengthMm;
    else {
      warnings.push({
        code: 'target_unreachable',
        message:
          found.kind === 'too-high'
            ? `Target tuning ${target.o.targetHz} Hz is above what even the shortest port gives: use a larger port area or a smaller box`
            : `Target tuning ${target.o.targetHz} Hz needs a port longer than fits in the box (${Math.round(maxLen)} mm): use a smaller port area or a larger box`,
        field: `openings[${target.i}].targetHz`,
      });
    }
  }

  let sdXi = 0;
  for (const o of design.openings) {
    if (o.type === 'driver' && o.coneAreaCm2 !== undefined && o.excursionMm !== undefined) sdXi += o.coneAreaCm2 * 1e-4 * o.excursionMm * MM;
  }
  if (sdXi > 0) {
    const v = peakPortAirSpeedMs(sdXi, 1, PORT_SPEED_FREQUENCY_RATIO * tuningHz, tuningHz, areaM2);
    plan.peakAirSpeedMs = v;
    const limit = audiblePortSpeedLimitMs(c);
    if (v > limit) {
      warnings.push({
        code: 'port_air_speed',
        message: `Estimated peak port air speed ${v.toFixed(1)} m/s is above about ${limit.toFixed(1)} m/s (5 % of the speed of sound), where port noise becomes audible: use a larger port area`,
        field: `openings[${ports[0]!.i}]`,
      });
    }
  }
  return { port: plan, warnings };
}

type Solve = { kind: 'ok'; lengthMm: number } | { kind: 'too-high' } | { kind: 'too-low' };

/**
 * The smallest length in [lo, hi] where f(length) falls to the target (f falls as the port grows on the
 * physical branch). Scans in steps, then bisects.
 */
function solveDecreasing(f: (x: number) => number, target: number, lo: number, hi: number): Solve {
  if (!(hi > lo)) return { kind: 'too-low' };
  if (f(lo) < target) return { kind: 'too-high' };
  const steps = 64;
  let prev = lo;
  for (let k = 1; k <= steps; k++) {
    const x = lo + ((hi - lo) * k) / steps;
    if (f(x) <= target) {
      let a = prev;
      let b = x;
      for (let it = 0; it < 60; it++) {
        const m = (a + b) / 2;
        if (f(m) > target) a = m;
        else b = m;
      }
      return { kind: 'ok', lengthMm: (a + b) / 2 };
    }
    prev = x;
  }
  return { kind: 'too-low' };
}
