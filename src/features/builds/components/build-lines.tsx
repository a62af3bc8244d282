import { Link } from 'react-router-dom';
import type { BuildItemDto } from '../../../../shared/schemas/api.schema';

/** "Harbour bookshelf × 2 (mirrored pair)", one per line. */
export function describeBuildLine(item: BuildItemDto): string {
  return `${item.designName ?? 'Deleted design'} × ${item.quantity}${item.mirroredPair ? ' (mirrored pair)' : ''}`;
}

export function BuildLines({ items, designHref }: { items: BuildItemDto[]; designHref?: (designId: number) => string }) {
  return (
    <ul className="space-y-0.5">
      {items.map((item) => (
        <li key={item.designId} className={item.designName ? undefined : 'text-red-700'}>
          {item.designName && designHref ? (
            <Link to={designHref(item.designId)} className="hover:text-accent-700 hover:underline">
              {describeBuildLine(item)}
            </Link>
          ) : (
            describeBuildLine(item)
          )}
        </li>
      ))}
    </ul>
  );
}
