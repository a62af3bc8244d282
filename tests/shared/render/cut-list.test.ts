import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { cutPartsFromBuild, nestPartsFromCutParts, buildLiningMassKg } from '../../../shared/render/build.js';
import { sheetsBoundText } from '../../../shared/render/cut-diagram.js';
import { CUT_LIST_HEADER, cutListCsv, cutListRows, materialTotals, numberSheets } from '../../../shared/render/cut-list.js';
import { exportFileName, slugify } from '../../../shared/render/file-names.js';
import { nestJobSchema, type Layout } from '../../../shared/schemas/nest.schema.js';
import { demoBuild } from './demo-build.js';
import { SMALL_LAYOUT, SMALL_PARTS, SMALL_STOCK } from './fixtures.js';

describe('cut list rows', () => {
  it('one row per part and sheet, in sheet order, with the layout counts', () => {
    const rows = cutListRows([SMALL_LAYOUT], SMALL_PARTS, SMALL_STOCK);
    expect(rows.map((r) => [r.part, r.quantity, r.sheet])).toEqual([
      ['Front (baffle)', 2, '1'],
      ['Back', 1, '1'],
      ['Left side', 2, '1'],
      ['Back lining 1', 1, 'roll 1'],
      ['Top lining', 1, 'roll 1'],
    ]);
    expect(rows[0]).toMatchObject({ cabinet: 'Harbour bookshelf', widthMm: 220, heightMm: 360, thicknessMm: 18, grain: 'along height', material: 'MDF' });
  });

  it('lists parts left over as "not placed" and parts missing from the plan as such', () => {
    const layout: Layout = { ...SMALL_LAYOUT, unplaced: [{ partId: 'back', quantity: 3 }] };
    const rows = cutListRows([layout], [...SMALL_PARTS, { ...SMALL_PARTS[0]!, id: 'extra', name: 'Spare baffle' }]);
    expect(rows.filter((r) => r.sheet === 'not placed').map((r) => [r.part, r.quantity])).toEqual([['Back', 3]]);
    expect(rows.filter((r) => r.sheet === 'not in this plan').map((r) => r.part)).toEqual(['Spare baffle']);
  });

  it('numbers sheets and remnants 1, 2, … and rolls "roll 1", "roll 2", … across layouts', () => {
    const two = numberSheets([SMALL_LAYOUT, SMALL_LAYOUT]).map((n) => n.label);
    expect(two).toEqual(['1', 'roll 1', '2', 'roll 2']);
  });
});

describe('CSV cut list (RFC 4180)', () => {
  it('has the header and reads back with papaparse to the same rows', () => {
    const rows = cutListRows([SMALL_LAYOUT], SMALL_PARTS, SMALL_STOCK);
    const csv = cutListCsv(rows);
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...CUT_LIST_HEADER]);
    expect(parsed.data).toHaveLength(rows.length);
    parsed.data.forEach((d, i) => {
      const r = rows[i]!;
      expect([d.part, d.cabinet, Number(d.width_mm), Number(d.height_mm), Number(d.thickness_mm), Number(d.quantity), d.grain, d.material, d.sheet]).toEqual([
        r.part,
        r.cabinet,
        r.widthMm,
        r.heightMm,
        r.thicknessMm,
        r.quantity,
        r.grain,
        r.material,
        r.sheet,
      ]);
    });
  });

  it('ends lines with CRLF and quotes fields with commas and quotes, doubling the quotes (RFC 4180 §2.1, §2.6, §2.7)', () => {
    const rows = cutListRows([SMALL_LAYOUT], [{ ...SMALL_PARTS[0]!, name: 'Side, "A"' }, ...SMALL_PARTS.slice(1)]);
    const csv = cutListCsv(rows);
    expect(csv.endsWith('\r\n')).toBe(true);
    expect(csv.split('\r\n')).toHaveLength(rows.length + 2);
    expect(csv).toContain('"Side, ""A"""');
    expect(Papa.parse<string[]>(csv).data[1]![0]).toBe('Side, "A"');
  });

  it('does not let a spreadsheet run a part name as a formula (CSV injection, OWASP; common practice)', () => {
    const csv = cutListCsv(cutListRows([SMALL_LAYOUT], [{ ...SMALL_PARTS[0]!, name: '=SUM(A1:A9)' }, ...SMALL_PARTS.slice(1)]));
    expect(csv).not.toMatch(/(^|,)=SUM/m);
    expect(csv).toContain("'=SUM(A1:A9)");
  });
});

describe('material totals', () => {
  it('count sheets and roll length and add up the cost by hand', () => {
    // 1 sheet × 38.50 + 0.400 m of roll × 6.20 per m = 38.50 + 2.48 = 40.98.
    const t = materialTotals([SMALL_LAYOUT], SMALL_STOCK, 1.25);
    expect(t.sheetsUsed).toBe(1);
    expect(t.rollLengthMm).toBe(400);
    expect(t.cost).toBeCloseTo(40.98, 10);
    expect(t.costIncomplete).toBe(false);
    expect(t.liningMassKg).toBe(1.25);
    expect(t.partsPlaced).toBe(7);
    // Parts 3 × 220 × 360 + 2 × 224 × 360 on the sheet, 189 × 193 + 89 × 179 on 1200 × 400 of roll:
    // (237 600 + 161 280 + 36 477 + 15 931) / (2 976 800 + 480 000) = 451 288 / 3 456 800.
    expect(t.utilisation).toBeCloseTo(451288 / 3456800, 12);
  });

  it('say so when some stock has no price, and give no cost when none has', () => {
    expect(materialTotals([SMALL_LAYOUT], [SMALL_STOCK[0]!]).costIncomplete).toBe(true);
    expect(materialTotals([SMALL_LAYOUT]).cost).toBeNull();
  });
});

describe('the fewest sheets possible', () => {
  const withBound = (lowerBound: number | undefined, unplaced: Layout['unplaced'] = []): Layout => ({
    ...SMALL_LAYOUT,
    unplaced,
    stats: { ...SMALL_LAYOUT.stats, ...(lowerBound !== undefined ? { lowerBound } : {}) },
  });

  it('adds up the layouts\' lower bounds and says where the count stands against it', () => {
    expect(materialTotals([withBound(1), withBound(2)]).sheetsLowerBound).toBe(3);
    expect(sheetsBoundText(3, 3)).toBe('the fewest possible');
    expect(sheetsBoundText(4, 3)).toBe('no layout can use fewer than 3');
  });

  it('says nothing when the bound is unknown (cost objective, older plans) or parts were left over', () => {
    expect(materialTotals([withBound(undefined)]).sheetsLowerBound).toBeUndefined();
    expect(materialTotals([withBound(0)]).sheetsLowerBound).toBeUndefined();
    expect(materialTotals([withBound(2, [{ partId: 'p1', quantity: 1 }])]).sheetsLowerBound).toBeUndefined();
    expect(sheetsBoundText(3, undefined)).toBe('');
  });
});

describe('parts of a build', () => {
  it('multiply per-cabinet quantities by the cabinets built, with unique readable ids', () => {
    const build = demoBuild();
    const parts = cutPartsFromBuild(build);
    const ids = new Set(parts.map((p) => p.id));
    expect(ids.size).toBe(parts.length);
    expect(parts.find((p) => p.id === 'harbour-slim-floorstander/left-side')).toMatchObject({ quantity: 4, material: 'MDF', kind: 'panel' });
    expect(parts.find((p) => p.id === 'harbour-bookshelf-two-way-rear-port/back-lining-1')).toMatchObject({ quantity: 2, material: 'polyester batt', thicknessMm: 50 });
    // Duplicated names get a suffix.
    const twice = cutPartsFromBuild([build[0]!, build[0]!]).map((p) => p.id);
    expect(new Set(twice).size).toBe(twice.length);
  });

  it('make a nest job the nest schema accepts; grained parts may not turn', () => {
    const parts = nestPartsFromCutParts(cutPartsFromBuild(demoBuild()));
    const job = nestJobSchema.safeParse({ stock: [{ id: 'mdf18', kind: 'sheet', width: 2440, height: 1220 }], parts });
    expect(job.success).toBe(true);
    for (const p of parts) expect(p.canRotate).toBe(p.grain === 'none');
  });

  it('add up the lining mass of all cabinets', () => {
    const build = demoBuild();
    const expected = build.reduce((a, c) => a + c.plan.lining!.massKg * c.count, 0);
    expect(buildLiningMassKg(build)).toBeCloseTo(expected, 12);
    expect(buildLiningMassKg([{ ...build[0]!, plan: { panels: [], liningPieces: [] } }])).toBeUndefined();
  });
});

describe('file names', () => {
  it('are slugs a person reads', () => {
    expect(exportFileName('Harbour bookshelf', 'stencils', 'a4')).toBe('harbour-bookshelf-stencils-a4.pdf');
    expect(exportFileName('Harbour Lane build', 'cut-diagrams')).toBe('harbour-lane-build-cut-diagrams.pdf');
    expect(exportFileName('Harbour Lane build', 'panels-dxf')).toBe('harbour-lane-build-panels.dxf');
    expect(exportFileName('Harbour Lane build', 'cut-list')).toBe('harbour-lane-build-cut-list.csv');
    expect(exportFileName('Harbour Lane build', 'cut-diagram-svg', 'roll 1')).toBe('harbour-lane-build-cut-diagram-roll-1.svg');
    expect(slugify('Résonance « Été » / 2×')).toBe('resonance-ete-2');
    expect(slugify('***')).toBe('boxwright');
    expect(slugify('a'.repeat(100)).length).toBe(60);
  });
});
