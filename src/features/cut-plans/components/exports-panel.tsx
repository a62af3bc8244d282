import { useState } from 'react';
import { SHEET_PAPERS } from '../../../../shared/render/paper';
import { buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Field, Input, Select } from '../../../components/ui/field';
import { exportHref, type ExportFile } from '../api/exports';

function Download({ href, children, testId }: { href: string; children: string; testId: string }) {
  return (
    <a href={href} download className={buttonClasses('secondary', 'md')} data-testid={testId}>
      {children}
    </a>
  );
}

/** Download buttons for every export of the plan, with the paper for the PDFs. */
export function ExportsPanel({ workshopId, planId }: { workshopId: number; planId: number }) {
  const [diagramPaper, setDiagramPaper] = useState<string>('A4');
  const [stencilPaper, setStencilPaper] = useState<string>('A4');
  const [rollWidth, setRollWidth] = useState('914');
  const href = (file: ExportFile, params?: Record<string, string | number | undefined>) => exportHref(workshopId, planId, file, params);
  const stencilParams = stencilPaper === 'roll' ? { paper: 'roll', rollWidthMm: rollWidth } : { paper: stencilPaper };
  return (
    <Card title="Exports" description="Files for the saw, the CNC router and the printer. Print stencils at 100 % (actual size, not “fit to page”) and measure the calibration square on each page before cutting.">
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_auto] xl:divide-x xl:divide-zinc-100">
        <div className="flex flex-wrap items-end gap-2">
          <Field label="Diagram paper" className="w-32">
            {({ id }) => (
              <Select id={id} value={diagramPaper} onChange={(e) => setDiagramPaper(e.target.value)}>
                {SHEET_PAPERS.map((p) => (
                  <option key={p}>{p}</option>
                ))}
              </Select>
            )}
          </Field>
          <Download href={href('cut-diagrams.pdf', { paper: diagramPaper })} testId="export-diagrams-pdf">
            Cut diagrams (PDF)
          </Download>
          <Download href={href('cut-diagrams.svg')} testId="export-diagrams-svg">
            Cut diagrams (SVG, mm)
          </Download>
          <Download href={href('cut-list.csv')} testId="export-csv">
            Cut list (CSV)
          </Download>
          <Download href={href('panels.dxf')} testId="export-dxf">
            Panels for CNC (DXF)
          </Download>
        </div>
        <div className="flex flex-wrap items-end gap-2 xl:pl-4">
          <Field label="Stencil paper" className="w-36">
            {({ id }) => (
              <Select id={id} value={stencilPaper} onChange={(e) => setStencilPaper(e.target.value)}>
                {SHEET_PAPERS.map((p) => (
                  <option key={p}>{p}</option>
                ))}
                <option value="roll">Plotter roll</option>
              </Select>
            )}
          </Field>
          {stencilPaper === 'roll' ? (
            <Field label="Roll width" unit="mm" className="w-32">
              {({ id }) => <Input id={id} withUnit type="number" inputMode="decimal" value={rollWidth} onChange={(e) => setRollWidth(e.target.value)} />}
            </Field>
          ) : null}
          <Download href={href('stencils.pdf', stencilParams)} testId="export-stencils">
            Full-size stencils (PDF)
          </Download>

        </div>
      </div>
    </Card>
  );
}
