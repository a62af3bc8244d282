import { useMemo } from 'react';
import { sheetName } from '../../../shared/render/cut-diagram';
import { numberSheets } from '../../../shared/render/cut-list';
import type { CutPlanGroupDto, CutPlanPartDto, CutPlanStockDto } from '../../../shared/schemas/api.schema';
import type { LayoutSheet } from '../../../shared/schemas/nest.schema';
import { SheetCard } from './sheet-card';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "2 sheets and 1 remnant", "1 roll length". */
export function countWords(sheets: readonly Pick<LayoutSheet, 'kind'>[]): string {
  const count = (kind: string) => sheets.filter((s) => (s.kind ?? 'sheet') === kind).length;
  const words = [
    count('sheet') ? plural(count('sheet'), 'sheet', 'sheets') : '',
    count('remnant') ? plural(count('remnant'), 'remnant', 'remnants') : '',
    count('roll') ? plural(count('roll'), 'roll length', 'roll lengths') : '',
  ];
  return words.filter(Boolean).join(' and ') || 'nothing laid out';
}

/**
 * Every sheet and roll of a plan, material by material, numbered as on the cut-diagram PDF ("Sheet 4",
 * "Remnant 1", "Roll 1"). `stock` is the plan's stock snapshot; a shared plan has none and names the material
 * from the group.
 */
export function PlanSheets({ groups, parts, stock = [] }: { groups: readonly CutPlanGroupDto[]; parts: readonly CutPlanPartDto[]; stock?: readonly CutPlanStockDto[] }) {
  const partsById = useMemo(() => new Map(parts.map((p) => [p.id, p])), [parts]);
  const stockById = useMemo(() => new Map(stock.map((s) => [s.id, s])), [stock]);
  const labelOf = useMemo(() => {
    const numbered = numberSheets(
      groups.map((g) => g.layout),
      stock.map((s) => ({ id: s.id, kind: s.kind })),
    );
    return new Map(numbered.map((e) => [e.sheet, sheetName(e)]));
  }, [groups, stock]);

  return (
    <>
      {groups.map((g) => (
        <section key={g.key} className="space-y-4">
          <h2 className="text-lg font-bold text-zinc-900">
            {g.label}{' '}
            <span className="text-sm font-normal text-zinc-500">
              · {countWords(g.layout.sheets)}
              {g.layout.unplaced.length ? ` · ${g.layout.unplaced.reduce((a, u) => a + u.quantity, 0)} not placed` : ''}
            </span>
          </h2>
          {g.layout.sheets.length === 0 ? <p className="text-sm text-zinc-500">Nothing laid out for this material (see the warnings above).</p> : null}
          {g.layout.sheets.map((sheet, i) => {
            const label = labelOf.get(sheet) ?? `Sheet ${i + 1}`;
            return <SheetCard key={label} label={label} sheet={sheet} parts={partsById} stock={stockById.get(sheet.stockId)} materialLabel={g.label} />;
          })}
        </section>
      ))}
    </>
  );
}
