import { Link } from 'react-router-dom';
import type { BuildDto } from '../../../../shared/schemas/api.schema';
import { formatDateTime, formatRelativeTime } from '../../../lib/format';
import { describeBuildLine } from './build-lines';

/** Every build of the workshop: what it makes, how many cabinets, its cut plans (the page says when there are none). */
export function BuildsTable({ builds, buildHref }: { builds: BuildDto[]; buildHref: (buildId: number) => string }) {
  return (
    <div className="overflow-x-auto rounded-xl border border-zinc-200 bg-white shadow-xs">
      <table className="w-full text-sm">
        <thead className="border-b border-zinc-200 bg-zinc-50 text-left text-[13px] whitespace-nowrap text-zinc-500">
          <tr>
            <th scope="col" className="px-4 py-2.5 font-normal">Build</th>
            <th scope="col" className="px-4 py-2.5 font-normal">Cabinets</th>
            <th scope="col" className="px-4 py-2.5 text-right font-normal">Total</th>
            <th scope="col" className="px-4 py-2.5 text-right font-normal">Cut plans</th>
            <th scope="col" className="hidden px-4 py-2.5 font-normal md:table-cell">Updated</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-zinc-100">
          {builds.map((b) => (
            <tr key={b.id} className="hover:bg-zinc-50/70">
              <td className="px-4 py-3 align-top">
                <Link to={buildHref(b.id)} className="font-bold text-zinc-900 hover:text-accent-700 hover:underline">
                  {b.name}
                </Link>
                {b.notes ? <p className="mt-0.5 text-xs text-zinc-500">{b.notes}</p> : null}
              </td>
              <td className="px-4 py-3 align-top text-zinc-700">
                {b.items.map((item) => (
                  <div key={item.designId} className={item.designName ? undefined : 'text-red-700'}>
                    {describeBuildLine(item)}
                  </div>
                ))}
              </td>
              <td className="px-4 py-3 text-right align-top tabular-nums">{b.cabinetCount}</td>
              <td className="px-4 py-3 text-right align-top tabular-nums">{b.cutPlanCount}</td>
              <td className="hidden px-4 py-3 align-top whitespace-nowrap text-zinc-600 md:table-cell" title={formatDateTime(b.updatedAt)}>
                {formatRelativeTime(b.updatedAt)}
                {b.updatedBy ? <span className="block text-xs text-zinc-400">{b.updatedBy}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
