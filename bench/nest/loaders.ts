/**
 * Loaders for the published instances in ../shared/benchmarks (formats in its README):
 * - 2BP classes I–X (Berkey & Wang 1987; Martello & Vigo 1998): `n`, `W H`, then `id w h` lines;
 * - strip sets C1–C7 (Hopper & Turton 2001) and N1–N13 (Burke, Kendall & Whitwell 2004) with the
 *   optimal heights of strip-optimal-heights.csv (perfect packings).
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const benchmarksDir = path.resolve(repoRoot, '../shared/benchmarks');

export interface RectInstance {
  name: string;
  /** Bin (or strip) width and height; for strips, height is the optimal height. */
  W: number;
  H: number;
  items: { w: number; h: number }[];
}

function numbers(text: string): number[][] {
  return text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter((l) => l.length > 0)
    .map((l) => l.split(/\s+/).map(Number));
}

/** Parses a file: `n`, `W H`, then n lines of `id w h` or `w h`. */
export function parseInstance(name: string, text: string): RectInstance {
  const rows = numbers(text);
  const n = rows[0]![0]!;
  const [W, H] = rows[1]!;
  const items = rows.slice(2, 2 + n).map((r) => (r.length >= 3 ? { w: r[1]!, h: r[2]! } : { w: r[0]!, h: r[1]! }));
  if (items.length !== n) throw new Error(`${name}: expected ${n} items, found ${items.length}`);
  return { name, W: W!, H: H!, items };
}

export function load2bp(): (RectInstance & { cls: number })[] {
  const dir = path.join(benchmarksDir, '2bp-berkey-wang-martello-vigo');
  return readdirSync(dir)
    .filter((f) => /^CLASS\d\d_\d{3}_\d\d$/.test(f))
    .sort()
    .map((f) => ({ ...parseInstance(f, readFileSync(path.join(dir, f), 'utf8')), cls: Number(f.slice(5, 7)) }));
}

export interface StripInstance extends RectInstance {
  set: 'C' | 'N';
  /** Instance name as in the papers (C1-1 … C7-3, N1 … N13). */
  label: string;
  optimalHeight: number;
}

export function loadStrip(): StripInstance[] {
  const csv = readFileSync(path.join(benchmarksDir, 'strip-optimal-heights.csv'), 'utf8').split(/\r?\n/).slice(1);
  const out: StripInstance[] = [];
  for (const line of csv) {
    const [set, label, file, , width, opt] = line.split(',');
    if (set !== 'C' && set !== 'N') continue;
    const dir = set === 'C' ? 'strip-hopper-turton-2001-C' : 'strip-burke-kendall-whitwell-2004-N';
    const inst = parseInstance(file!, readFileSync(path.join(benchmarksDir, dir, file!), 'utf8'));
    if (inst.W !== Number(width) || inst.H !== Number(opt)) throw new Error(`${file}: header does not match the CSV`);
    out.push({ ...inst, set, label: label!, optimalHeight: Number(opt) });
  }
  return out;
}
