import type { MemberDto } from '../../../shared/schemas/api.schema';

/**
 * The member whose role may not change and who may not be removed: the workshop's only owner (the server
 * refuses both with 400, so the page disables them and says why). undefined when there are several owners.
 */
export function soleOwnerId(members: readonly Pick<MemberDto, 'userId' | 'role'>[]): number | undefined {
  const owners = members.filter((m) => m.role === 'owner');
  return owners.length === 1 ? owners[0]!.userId : undefined;
}

export const SOLE_OWNER_NOTE = 'The only owner: make someone else an owner first to change this role or remove them.';
