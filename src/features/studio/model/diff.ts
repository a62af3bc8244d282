/**
 * What changed between two versions of a design, field by field, for the "edited elsewhere" dialog.
 */
import { getAtPath } from './commands';
import type { StudioDoc } from './types';

export interface FieldChange {
  /** Field path as the API names it, e.g. `braces[0].position`. */
  path: string;
  label: string;
  theirs: unknown;
  mine: unknown;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function walk(a: unknown, b: unknown, path: (string | number)[], out: (string | number)[][]): void {
  if (Object.is(a, b)) return;
  if (Array.isArray(a) && Array.isArray(b) && a.every((x) => !isObject(x)) && b.every((x) => !isObject(x))) {
    // Short lists of plain values (faces, joinery, at, section): one change for the whole list.
    if (a.length !== b.length || a.some((x, i) => !Object.is(x, b[i]))) out.push(path);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    const n = Math.max(a.length, b.length);
    for (let i = 0; i < n; i++) {
      if (i >= a.length || i >= b.length) out.push([...path, i]);
      else walk(a[i], b[i], [...path, i], out);
    }
    return;
  }
  if (isObject(a) && isObject(b)) {
    for (const key of new Set([...Object.keys(a), ...Object.keys(b)])) walk(a[key], b[key], [...path, key], out);
    return;
  }
  out.push(path);
}

function formatPath(path: (string | number)[]): string {
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('');
}

const WORDS: Record<string, string> = {
  outer: 'Outer',
  width: 'width',
  height: 'height',
  depth: 'depth',
  material: 'Material',
  thickness: 'thickness',
  baffleThickness: 'Baffle thickness',
  joinery: 'Joinery order',
  lining: 'Lining',
  faces: 'faces',
  crush: 'crush allowance',
  density: 'density',
  airTemperatureC: 'Air temperature',
  name: 'name',
  position: 'position',
  at: 'position',
  section: 'section',
  windows: 'windows',
  diameter: 'diameter',
  length: 'length',
  targetHz: 'target tuning',
  face: 'face',
  displacementLitres: 'displacement',
  wall: 'wall',
};

/** A plain label: `openings[2].length` → "Opening 3 (port): length". */
export function labelFor(path: (string | number)[], doc: StudioDoc): string {
  const [head, index, ...rest] = path;
  const tail = (parts: (string | number)[]) => parts.map((p) => (typeof p === 'number' ? `${p + 1}` : WORDS[p] ?? p)).join(' ');
  if ((head === 'braces' || head === 'openings') && typeof index === 'number') {
    const item = getAtPath(doc, [head, index]) as { type?: string } | undefined;
    const noun = head === 'braces' ? 'Brace' : 'Opening';
    const kind = item?.type ? ` (${item.type})` : '';
    return rest.length ? `${noun} ${index + 1}${kind}: ${tail(rest)}` : `${noun} ${index + 1}${kind}`;
  }
  if (head === 'name' && path.length === 1) return 'Name';
  return tail(path).replace(/^./, (c) => c.toUpperCase());
}

export function diffDesigns(theirs: StudioDoc, mine: StudioDoc): FieldChange[] {
  const paths: (string | number)[][] = [];
  walk(theirs, mine, [], paths);
  return paths.map((p) => ({
    path: formatPath(p),
    label: labelFor(p, getAtPath(mine, p.slice(0, 2)) !== undefined ? mine : theirs),
    theirs: getAtPath(theirs, p),
    mine: getAtPath(mine, p),
  }));
}
