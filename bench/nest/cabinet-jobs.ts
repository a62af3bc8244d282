/**
 * Generated cabinet jobs for the bench: cabinets of six invented families (bookshelf, stand-mount,
 * slim and large floor-standers, subwoofer, centre), sizes drawn with a fixed seed, planned by the
 * cabinet engine (planDesign), taken as stereo pairs, batches and a home-theatre set, with and without
 * grain, kerf 3.2 mm, trim 10 mm, on each sheet size REFERENCES.md §7 lists (common practice):
 * 2440 × 1220, 3050 × 1220, 2800 × 2070, 2500 × 1250 and 1525 × 1525 mm. The size list was fixed from
 * the references before any run on it, so no size was picked for how the packers fare on it.
 * Also the lining pieces of each job on a 1200 mm roll, and the 200- and 2000-part jobs.
 */
import type { DesignInput } from '../../shared/schemas/design.schema.js';
import type { NestJobInput } from '../../shared/schemas/nest.schema.js';
import { planDesign } from '../../shared/cabinet/index.js';
import { mulberry32, type Rng } from '../../shared/nesting/rng.js';

type Family = 'bookshelf' | 'standmount' | 'slim floorstander' | 'floorstander' | 'subwoofer' | 'centre';

const RANGES: Record<Family, { w: [number, number]; h: [number, number]; d: [number, number]; braces: number; baffle: number }> = {
  bookshelf: { w: [200, 260], h: [320, 420], d: [240, 300], braces: 1, baffle: 18 },
  standmount: { w: [240, 320], h: [380, 500], d: [280, 360], braces: 1, baffle: 25 },
  'slim floorstander': { w: [180, 240], h: [900, 1100], d: [260, 340], braces: 2, baffle: 25 },
  floorstander: { w: [240, 320], h: [950, 1150], d: [320, 420], braces: 3, baffle: 18 },
  subwoofer: { w: [380, 560], h: [380, 560], d: [380, 560], braces: 1, baffle: 25 },
  centre: { w: [480, 650], h: [180, 240], d: [240, 320], braces: 1, baffle: 18 },
};

const draw = (rng: Rng, [lo, hi]: [number, number]) => Math.round((lo + rng() * (hi - lo)) / 2) * 2;

export function makeDesign(family: Family, rng: Rng, name: string): DesignInput {
  const r = RANGES[family];
  const W = draw(rng, r.w);
  const H = family === 'subwoofer' ? W : draw(rng, r.h);
  const D = family === 'subwoofer' ? W : draw(rng, r.d);
  const t = 18;
  const braces: DesignInput['braces'] = [];
  for (let b = 1; b <= r.braces; b++) {
    braces.push({ type: 'shelf', axis: 'y', position: Math.round((H * b) / (r.braces + 1)), thickness: t, windows: [{ shape: 'round', u: W / 2, v: D / 2, diameter: Math.round(Math.min(W, D) * 0.35) }] });
  }
  const woofer = Math.min(Math.round(W * 0.7), family === 'subwoofer' ? 300 : 180);
  const woofY = family === 'centre' ? H / 2 : Math.round(H * (family.includes('floor') ? 0.62 : 0.4));
  const openings: DesignInput['openings'] = [
    { type: 'driver', face: 'front', x: family === 'centre' ? Math.round(W * 0.25) : W / 2, y: woofY, diameter: Math.min(woofer, H - 60), displacementLitres: 0.3 },
    { type: 'port', face: 'back', x: W / 2, y: Math.round(H * 0.25), diameter: family === 'subwoofer' ? 100 : 50, wall: 3, length: 120 },
    { type: 'terminal', face: 'back', x: W / 2, y: Math.round(H * 0.75), width: 60, height: 60 },
  ];
  if (family !== 'subwoofer') {
    openings.push({ type: 'driver', face: 'front', x: family === 'centre' ? Math.round(W * 0.75) : W / 2, y: family === 'centre' ? H / 2 : Math.round(H * 0.85), diameter: 75, displacementLitres: 0.05 });
  }
  return {
    name,
    outer: { width: W, height: H, depth: D },
    material: { name: 'MDF', thickness: t },
    baffleThickness: r.baffle,
    joinery: ['frontBack', 'sides', 'topBottom'],
    braces,
    openings,
    lining: { thickness: 50, faces: ['left', 'right', 'top', 'bottom', 'back'], crush: 5, density: 20 },
    airTemperatureC: 20,
  };
}

export interface CabinetJob {
  name: string;
  grain: boolean;
  /** Sheet size, e.g. "2440 × 1220". */
  sheet: string;
  /** Panels on sheets. */
  sheets: NestJobInput;
  /** Lining pieces on a 1200 mm roll. */
  lining: NestJobInput;
}

/** Sheet sizes (length × width, mm) from REFERENCES.md §7. */
export const SHEET_SIZES: readonly { width: number; height: number }[] = [
  { width: 2440, height: 1220 },
  { width: 3050, height: 1220 },
  { width: 2800, height: 2070 },
  { width: 2500, height: 1250 },
  { width: 1525, height: 1525 },
];

const sheetLabel = (s: { width: number; height: number }) => `${s.width} × ${s.height}`;

function jobFrom(
  name: string,
  cabinets: { design: DesignInput; count: number }[],
  grain: boolean,
  mode: 'free' | 'guillotine',
  SHEET: { width: number; height: number } = SHEET_SIZES[0]!,
): CabinetJob {
  const parts: NestJobInput['parts'] = [];
  const lining: NestJobInput['parts'] = [];
  const thicknesses = new Set<number>();
  cabinets.forEach(({ design, count }, c) => {
    const r = planDesign(design);
    if (!r.ok) throw new Error(`bench design ${design.name} does not plan: ${r.message}`);
    for (const p of r.plan.panels) {
      thicknesses.add(p.thickness);
      parts.push({
        id: `c${c}-${p.name}`,
        label: `${design.name}: ${p.name}`,
        width: p.width,
        height: p.height,
        quantity: p.quantity * count,
        material: 'MDF',
        thickness: p.thickness,
        grain: grain ? 'height' : 'none',
      });
    }
    for (const l of r.plan.liningPieces) {
      lining.push({ id: `c${c}-${l.name}`, width: l.width, height: l.height, quantity: l.quantity * count, material: 'polyester' });
    }
  });
  const stock: NestJobInput['stock'] = [...thicknesses].sort().map((t) => ({
    id: `mdf-${t}`,
    kind: 'sheet' as const,
    ...SHEET,
    trim: 10,
    grain: grain ? ('length' as const) : ('none' as const),
    material: 'MDF',
    thickness: t,
    cost: 40,
  }));
  return {
    name,
    grain,
    sheet: sheetLabel(SHEET),
    sheets: { kerf: 3.2, mode, seed: 1, timeLimitMs: 2000, stock, parts },
    lining: { kerf: 0, mode: 'free', seed: 1, timeLimitMs: 2000, stock: [{ id: 'batt-1200', kind: 'roll', width: 1200, material: 'polyester', cost: 6 }], parts: lining },
  };
}

/** The bench's cabinet jobs: every set on every sheet size, with and without grain. */
export function cabinetJobs(mode: 'free' | 'guillotine' = 'free'): CabinetJob[] {
  const rng = mulberry32(2024);
  const d = (f: Family) => makeDesign(f, rng, f);
  const sets: { name: string; cabinets: { design: DesignInput; count: number }[] }[] = [];
  const families: Family[] = ['bookshelf', 'standmount', 'slim floorstander', 'floorstander', 'subwoofer', 'centre'];
  const plural: Record<Family, string> = { bookshelf: 'bookshelves', standmount: 'standmounts', 'slim floorstander': 'slim floorstanders', floorstander: 'floorstanders', subwoofer: 'subwoofers', centre: 'centres' };
  for (const f of families) sets.push({ name: `pair of ${plural[f]}`, cabinets: [{ design: d(f), count: 2 }] });
  sets.push({ name: 'batch of 4 slim floorstanders', cabinets: [{ design: d('slim floorstander'), count: 4 }] });
  sets.push({ name: 'batch of 6 bookshelves', cabinets: [{ design: d('bookshelf'), count: 6 }] });
  sets.push({ name: 'batch of 4 standmounts', cabinets: [{ design: d('standmount'), count: 4 }] });
  sets.push({ name: 'batch of 4 floorstanders', cabinets: [{ design: d('floorstander'), count: 4 }] });
  sets.push({ name: 'batch of 3 subwoofers', cabinets: [{ design: d('subwoofer'), count: 3 }] });
  sets.push({
    name: 'home-theatre set',
    cabinets: [
      { design: d('floorstander'), count: 2 },
      { design: d('centre'), count: 1 },
      { design: d('bookshelf'), count: 2 },
      { design: d('subwoofer'), count: 1 },
    ],
  });
  sets.push({ name: 'two pairs (bookshelf + floorstander)', cabinets: [{ design: d('bookshelf'), count: 2 }, { design: d('slim floorstander'), count: 2 }] });
  const jobs: CabinetJob[] = [];
  for (const size of SHEET_SIZES) {
    for (const s of sets) {
      jobs.push(jobFrom(s.name, s.cabinets, false, mode, size));
      jobs.push(jobFrom(s.name, s.cabinets, true, mode, size));
    }
  }
  return jobs;
}

/** A production batch of about `parts` panels: cabinets of every family until the count is reached. */
export function largeJob(targetParts: number, seed: number): NestJobInput {
  const rng = mulberry32(seed);
  const families: Family[] = ['bookshelf', 'standmount', 'slim floorstander', 'floorstander', 'subwoofer', 'centre'];
  const cabinets: { design: DesignInput; count: number }[] = [];
  let n = 0;
  let k = 0;
  while (n < targetParts) {
    const f = families[k++ % families.length]!;
    const design = makeDesign(f, rng, `${f} ${k}`);
    const r = planDesign(design);
    if (!r.ok) throw new Error(r.message);
    const per = r.plan.panels.reduce((s, p) => s + p.quantity, 0);
    const count = Math.max(1, Math.min(2, Math.floor((targetParts - n) / per)));
    cabinets.push({ design, count });
    n += per * count;
  }
  const job = jobFrom(`${n} parts`, cabinets, false, 'guillotine').sheets;
  return job;
}
