import { useRef, useState } from 'react';
import type { CsvRowProblem } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { isApiError } from '../../../lib/api-client';
import { notify } from '../../../lib/notify';
import { useImportStockCsv } from '../api/stock';

/** The server names bad cells as "row N, column" in `fields`; back into rows for the report table. */
export function problemsFromFields(fields: Record<string, string>): CsvRowProblem[] {
  return Object.entries(fields).flatMap(([key, reason]) => {
    const m = /^row (\d+), (.+)$/.exec(key);
    return m ? [{ row: Number(m[1]), column: m[2]!, reason }] : [{ row: 0, column: key, reason }];
  });
}

export const STOCK_CSV_EXAMPLE = [
  'kind,material,thickness_mm,width_mm,height_mm,length_mm,quantity,cost,grain,note',
  'sheet,MDF,18,2440,1220,,10,38.50,none,',
  'remnant,MDF,18,900,450,,1,,none,from the last job',
  'roll,Polyester batt,50,1200,,12000,1,6.20,none,cost per metre',
].join('\n');

/** CSV import with a row-by-row report: a file with any bad row imports nothing. */
export function ImportStockCsvDialog({ workshopId, open, onClose }: { workshopId: number; open: boolean; onClose: () => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const importCsv = useImportStockCsv(workshopId);
  const error = importCsv.error;
  const problems = isApiError(error) ? problemsFromFields(error.fields) : [];

  const close = () => {
    importCsv.reset();
    setFile(null);
    onClose();
  };

  return (
    <Dialog
      open={open}
      onClose={close}
      wide
      title="Import stock from a CSV file"
      footer={
        <>
          <Button onClick={close}>Close</Button>
          <Button
            variant="primary"
            disabled={!file}
            busy={importCsv.isPending}
            onClick={() =>
              file &&
              importCsv.mutate(file, {
                onSuccess: (r) => {
                  notify(`Imported ${r.imported} stock item${r.imported === 1 ? '' : 's'}.`, 'success');
                  close();
                },
              })
            }
          >
            Import
          </Button>
        </>
      }
    >
      <p>
        One row per item, with a header row. Columns: <code className="text-xs">kind, material, thickness_mm, width_mm</code> and optionally{' '}
        <code className="text-xs">height_mm, length_mm, quantity, cost, grain, note</code>. An empty quantity means unlimited. If any row has a
        problem, nothing is imported and every problem is listed.
      </p>
      <pre className="mt-2 overflow-x-auto rounded-md bg-zinc-50 p-2 text-xs text-zinc-700">{STOCK_CSV_EXAMPLE}</pre>
      <label className="mt-3 block text-[13px] text-zinc-600">
        CSV file
        <input
          ref={input}
          type="file"
          accept=".csv,text/csv"
          className="mt-1 block w-full text-sm"
          onChange={(e) => {
            importCsv.reset();
            setFile(e.target.files?.[0] ?? null);
          }}
        />
      </label>
      {error ? (
        <div role="alert" className="mt-3 rounded-md bg-red-50 px-3 py-2 text-red-800">
          <p className="font-bold">{error.message}</p>
          {problems.length ? (
            <table className="mt-2 w-full text-left text-[13px]" data-testid="csv-report">
              <thead>
                <tr>
                  <th className="pr-3 font-bold">Row</th>
                  <th className="pr-3 font-bold">Column</th>
                  <th className="font-bold">Problem</th>
                </tr>
              </thead>
              <tbody>
                {problems.map((p) => (
                  <tr key={`${p.row}-${p.column}`}>
                    <td className="pr-3 tabular-nums">{p.row || '—'}</td>
                    <td className="pr-3">{p.column}</td>
                    <td>{p.reason}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </Dialog>
  );
}
