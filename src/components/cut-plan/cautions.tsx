import { CUT_DIAGRAM_CAUTIONS } from '../../../shared/render/cautions';
import { cn } from '../../lib/cn';

/**
 * The cautions printed on the cut diagrams (shared/render/cautions.ts: dust, saws, lifting, fibres, local rules),
 * shown wherever cutting happens: the cut plan, the checklist at the saw, a shared plan. The same words as the
 * printout; "Dust:" and the like in bold so a glance finds the one that matters.
 */
export function CuttingCautions({ narrow = false, className }: { narrow?: boolean; className?: string }) {
  return (
    <section aria-labelledby="cautions-heading" className={cn('rounded-xl border border-amber-300 bg-amber-50 px-5 py-3.5 text-amber-950', className)}>
      <h2 id="cautions-heading" className="text-sm font-bold">
        Cautions before you cut
      </h2>
      <ul className={cn('mt-1.5 grid gap-x-6 gap-y-1.5 text-xs leading-relaxed', !narrow && 'md:grid-cols-2')} data-testid="cautions">
        {CUT_DIAGRAM_CAUTIONS.map((c) => {
          const colon = c.indexOf(': ');
          const head = colon > 0 && colon < 20 ? c.slice(0, colon) : '';
          return (
            <li key={c}>
              {head ? <strong>{head}: </strong> : null}
              {head ? c.slice(colon + 2) : c}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
