import { Link } from 'react-router-dom';
import type { MembershipDto } from '../../../../shared/schemas/api.schema';
import { ROLE_LABELS } from '../../../lib/roles';

export function WorkshopPicker({ memberships, hrefFor }: { memberships: MembershipDto[]; hrefFor: (workshopId: number) => string }) {
  if (memberships.length === 0) {
    return <p className="text-sm text-zinc-600">You are not a member of any workshop yet. Ask a workshop owner to invite you, or start a new workshop below.</p>;
  }
  return (
    <ul className="divide-y divide-zinc-100 overflow-hidden rounded-lg border border-zinc-200">
      {memberships.map((m) => (
        <li key={m.workshopId}>
          <Link
            to={hrefFor(m.workshopId)}
            className="flex items-center justify-between gap-4 px-4 py-3 hover:bg-zinc-50 focus-visible:bg-zinc-50"
          >
            <span className="font-bold text-zinc-900">{m.workshopName}</span>
            <span className="text-sm text-zinc-500">{ROLE_LABELS[m.role]} ›</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
