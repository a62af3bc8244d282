/**
 * Item-level helpers of the inspector: names of braces and openings as the studio shows them, and the
 * changes of shape and of optional parts (a window turned round, a port made a slot, a driver given a
 * rebate or screw holes, a face lined or not). Pure: each returns a new item, never mutating.
 */
import type {
  BraceWindow,
  DriverOpening,
  Face,
  Lining,
  PortOpening,
  TerminalOpening,
} from '../../../../shared/schemas/design.schema';
import { cavity } from './geometry';
import type { Selection, StudioDoc } from './types';

/** Plain trade names; numbered per kind, as the side form numbers them ("Driver 2", "Shelf brace 1"). */
const OPENING_NAMES = { driver: 'Driver', port: 'Port', terminal: 'Terminal', lead: 'Cable lead' } as const;

export interface ItemEntry {
  selection: Exclude<Selection, null | { kind: 'box' }>;
  label: string;
  /** Where it is, in a few words ("front", "across y"). */
  detail: string;
}

/** Every brace and opening of the design, named and numbered per kind, in document order. */
export function listItems(doc: StudioDoc): ItemEntry[] {
  const counts = new Map<string, number>();
  const next = (name: string) => {
    const n = (counts.get(name) ?? 0) + 1;
    counts.set(name, n);
    return `${name} ${n}`;
  };
  const braces: ItemEntry[] = doc.braces.map((b, index) => ({
    selection: { kind: 'brace', index },
    label: next(b.type === 'shelf' ? 'Shelf brace' : 'Bar brace'),
    detail: b.type === 'shelf' ? `across ${b.axis}` : `along ${b.axis}`,
  }));
  const openings: ItemEntry[] = doc.openings.map((o, index) => {
    const name = o.type === 'port' ? (o.shape === 'slot' ? 'Slot port' : 'Round port') : OPENING_NAMES[o.type];
    return { selection: { kind: 'opening', index }, label: next(name), detail: o.face };
  });
  return [...braces, ...openings];
}

/** The name of the selected brace or opening (null for the box or nothing). */
export function itemLabel(doc: StudioDoc, sel: Selection): string | null {
  if (!sel || sel.kind === 'box') return null;
  return listItems(doc).find((e) => e.selection.kind === sel.kind && e.selection.index === sel.index)?.label ?? null;
}

const round1 = (v: number) => Math.round(v * 10) / 10;

/** A window turned round keeps its centre; its diameter is the smaller side, and back again (a square). */
export function withWindowShape(w: BraceWindow, shape: BraceWindow['shape']): BraceWindow {
  if (w.shape === shape) return w;
  if (w.shape === 'rect') return { shape: 'round', u: w.u, v: w.v, diameter: Math.min(w.width, w.height) };
  return { shape: 'rect', u: w.u, v: w.v, width: w.diameter, height: w.diameter };
}

/**
 * A round port made a slot keeps its open area (the same tuning to first order): a slot of the cavity
 * width's 60 % (our choice) and the height that gives that area; a slot made round gets the diameter of
 * the same area, d = 2·√(w·h/π) (equal-area diameter, REFERENCES.md §1, common practice).
 */
export function withPortShape(doc: StudioDoc, o: PortOpening, shape: PortOpening['shape']): PortOpening {
  if (o.shape === shape) return o;
  const { diameter: _d, width: _w, height: _h, ...rest } = o;
  if (shape === 'slot') {
    const area = Math.PI * ((o.diameter ?? 50) / 2) ** 2;
    const c = cavity(doc);
    const width = round1(Math.max(10, (c.x.max - c.x.min) * 0.6));
    return { ...rest, shape, wall: 0, width, height: round1(Math.max(5, area / width)) };
  }
  const area = (o.width ?? 100) * (o.height ?? 30);
  return { ...rest, shape, wall: o.wall || 3, diameter: round1(2 * Math.sqrt(area / Math.PI)) };
}

/** A rectangular terminal cut-out made round gets its smaller side as diameter; round to square. */
export function withTerminalShape(o: TerminalOpening, shape: 'rect' | 'round'): TerminalOpening {
  const { width: _w, height: _h, diameter: _d, ...rest } = o;
  const isRect = o.width !== undefined && o.height !== undefined;
  if ((shape === 'rect') === isRect) return o;
  if (shape === 'round') return { ...rest, diameter: Math.min(o.width ?? 40, o.height ?? 40) };
  const side = o.diameter ?? 40;
  return { ...rest, width: side, height: side };
}

/** A rebate for flush mounting: 8 mm wider than the cut-out each side, 5 mm deep (our starting values). */
export function defaultRebate(d: DriverOpening): NonNullable<DriverOpening['rebate']> {
  return { diameter: round1(d.diameter + 16), depth: 5 };
}

/** Four 4 mm screw holes on a circle 4 mm outside the cut-out (our starting values; the designer types the driver's). */
export function defaultScrewHoles(d: DriverOpening): NonNullable<DriverOpening['screwHoles']> {
  return { count: 4, circleDiameter: round1(d.diameter + 8), holeDiameter: 4 };
}

/**
 * The lining with one face lined or not. Faces keep their order and a newly lined face goes last, so a
 * design that only ever had the default faces keeps the default list.
 */
export function withLinedFace(lining: Lining, face: Face, lined: boolean): Lining {
  const has = lining.faces.includes(face);
  if (has === lined) return lining;
  return { ...lining, faces: lined ? [...lining.faces, face] : lining.faces.filter((f) => f !== face) };
}

const FIELD_WORDS: Record<string, string> = {
  targetHz: 'target tuning',
  displacementLitres: 'displacement',
  screwHoles: 'screw holes',
  circleDiameter: 'circle diameter',
  holeDiameter: 'hole diameter',
  coneAreaCm2: 'cone area',
  excursionMm: 'excursion',
  minSliver: 'smallest strip',
  portClearance: 'port clearance',
  baffleThickness: 'baffle thickness',
  airTemperatureC: 'air temperature',
  at: 'position',
  u: 'centre u',
  v: 'centre v',
};

function words(parts: string[]): string {
  return parts
    .map((p) => (/^\d+$/.test(p) ? String(Number(p) + 1) : FIELD_WORDS[p] ?? p.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()))
    .join(' ')
    .replace(/\b(window|brace|opening)s (\d+)/g, '$1 $2');
}

/**
 * A field path from the engine or the API, in words: `braces[0].position` → "Shelf brace 1, position",
 * `openings[2].length` → "Round port 1, length", `outer.width` → "Outer width".
 */
export function describeField(doc: StudioDoc, field: string): string {
  const parts = field.split(/[.[\]]+/).filter(Boolean);
  const [head, index, ...rest] = parts;
  if ((head === 'braces' || head === 'openings') && index !== undefined && /^\d+$/.test(index)) {
    const label = itemLabel(doc, { kind: head === 'braces' ? 'brace' : 'opening', index: Number(index) }) ?? `${head === 'braces' ? 'Brace' : 'Opening'} ${Number(index) + 1}`;
    return rest.length > 0 ? `${label}, ${words(rest)}` : label;
  }
  const text = words(parts);
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * An engine message as the studio shows it: item paths in it named as the studio names the items
 * ("The port tube at openings[2] crosses …" → "The port tube at Round port 1 crosses …"), first letter capital.
 */
export function plainMessage(doc: StudioDoc, message: string): string {
  const text = message.replace(/\b(braces|openings)\[(\d+)\](?![.[])/g, (whole, head: string, index: string) => {
    return itemLabel(doc, { kind: head === 'braces' ? 'brace' : 'opening', index: Number(index) }) ?? whole;
  });
  return text.charAt(0).toUpperCase() + text.slice(1);
}
