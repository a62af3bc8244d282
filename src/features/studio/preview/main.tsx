/**
 * Development preview of the studio on its own (`npx vite` then open /src/features/studio/preview/),
 * used for screenshots while building. Not part of the production build.
 */
import { StrictMode, Suspense, lazy, useState } from 'react';
import { createRoot } from 'react-dom/client';
import '../../../index.css';
import { designSchema } from '../../../../shared/schemas/design.schema';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../../../shared/demo/designs';
import { ConflictChanges } from '../conflict';
import type { StudioDoc, UnitSystem } from '../model/types';

const DesignStudio = lazy(() => import('../index'));

function Preview() {
  const params = new URLSearchParams(location.search);
  const demo = params.get('demo') === 'floor' ? DEMO_FLOORSTANDER : DEMO_BOOKSHELF;
  const [design, setDesign] = useState<StudioDoc>(() => designSchema.parse(demo));
  const [units, setUnits] = useState<UnitSystem>((params.get('units') as UnitSystem) ?? 'mm');
  const [conflict, setConflict] = useState(params.get('conflict') === '1');
  const theirs = { ...design, outer: { ...design.outer, width: design.outer.width + 20 }, name: 'Harbour bookshelf (rev B)' };
  return (
    <div className="mx-auto max-w-[1900px] p-4">
      <div className="mb-3 flex items-center justify-between">
        <h1 className="text-[17px] font-bold text-zinc-800">{design.name}</h1>
        <button className="rounded border border-zinc-300 px-2 py-1 text-[12px]" onClick={() => setConflict(true)}>
          Show conflict
        </button>
      </div>
      <Suspense fallback={<p>Loading the studio…</p>}>
        <DesignStudio
          design={design}
          readOnly={params.get('ro') === '1'}
          units={units}
          onChange={setDesign}
          onUnitsChange={setUnits}
        />
      </Suspense>
      {conflict && (
        <div className="mt-4 max-w-xl rounded border border-zinc-200 bg-white p-4" data-testid="conflict-preview">
          <ConflictChanges theirs={theirs} mine={design} units={units} />
          <button className="mt-2 rounded border border-zinc-300 px-2 py-1 text-[12px]" onClick={() => setConflict(false)}>
            Close
          </button>
        </div>
      )}
    </div>
  );
}

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <Preview />
  </StrictMode>,
);
