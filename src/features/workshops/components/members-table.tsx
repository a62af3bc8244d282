import { useState } from 'react';
import { ROLES, type MemberDto, type Role } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { Select } from '../../../components/ui/field';
import { Spinner } from '../../../components/ui/spinner';
import { LoadError } from '../../../components/ui/states';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/roles';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMemberRole } from '../api/update-member-role';
import { SOLE_OWNER_NOTE, soleOwnerId } from '../members';

export function MembersTable({ workshopId, canManage, currentUserId }: { workshopId: number; canManage: boolean; currentUserId: number }) {
  const members = useMembers(workshopId);
  const updateRole = useUpdateMemberRole(workshopId);
  const remove = useRemoveMember(workshopId);
  const [removing, setRemoving] = useState<MemberDto | null>(null);

  if (members.isPending) return <Spinner label="Loading members…" />;
  if (members.isError)
    return (
      <LoadError what="the members" error={members.error} onRetry={() => members.refetch()} />
    );
  const soleOwner = soleOwnerId(members.data);

  return (
    <>
      <div className="overflow-x-auto rounded-xl border border-zinc-200 bg-white shadow-xs">
        <table className="w-full text-sm">
          <thead className="border-b border-zinc-200 bg-zinc-50 text-left text-[13px] text-zinc-500">
            <tr>
              <th scope="col" className="px-5 py-2.5 font-normal">
                E-mail
              </th>
              <th scope="col" className="px-5 py-2.5 font-normal">
                Role
              </th>
              <th scope="col" className="hidden px-5 py-2.5 font-normal md:table-cell">
                May
              </th>
              {canManage ? (
                <th scope="col" className="px-5 py-2.5 font-normal">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody className="divide-y divide-zinc-100">
            {members.data.map((member) => {
              const isMe = member.userId === currentUserId;
              const locked = member.userId === soleOwner;
              return (
                <tr key={member.userId} data-testid="member-row">
                  <td className="px-5 py-3 text-zinc-900">
                    {member.email}
                    {isMe ? <span className="ml-2 text-xs text-zinc-500">(you)</span> : null}
                  </td>
                  <td className="w-44 px-5 py-2">
                    {canManage ? (
                      <Select
                        aria-label={`Role of ${member.email}`}
                        value={member.role}
                        disabled={updateRole.isPending || locked}
                        title={locked ? SOLE_OWNER_NOTE : undefined}
                        onChange={(event) => updateRole.mutate({ userId: member.userId, role: event.target.value as Role })}
                      >
                        {ROLES.map((role) => (
                          <option key={role} value={role}>
                            {ROLE_LABELS[role]}
                          </option>
                        ))}
                      </Select>
                    ) : (
                      ROLE_LABELS[member.role]
                    )}
                  </td>
                  <td className="hidden px-5 py-3 text-zinc-500 md:table-cell">{ROLE_DESCRIPTIONS[member.role]}</td>
                  {canManage ? (
                    <td className="px-5 py-2 text-right">
                      {locked ? (
                        <span className="text-xs text-zinc-500" data-testid="sole-owner-note">
                          Only owner
                        </span>
                      ) : (
                        <Button size="sm" variant="ghostDanger" onClick={() => setRemoving(member)}>
                          Remove
                        </Button>
                      )}
                    </td>
                  ) : null}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {canManage && soleOwner !== undefined ? <p className="mt-3 text-[13px] text-zinc-500">{SOLE_OWNER_NOTE}</p> : null}
      <ConfirmDialog
        open={removing !== null}
        title="Remove this member?"
        confirmLabel="Remove member"
        tone="danger"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          setRemoving(null);
          remove.reset();
        }}
        onConfirm={() =>
          removing &&
          remove.mutate(removing.userId, {
            onSuccess: () => setRemoving(null),
          })
        }
      >
        {removing ? (
          <p>
            <strong className="text-zinc-900">{removing.email}</strong> will no longer be able to open this workshop. Their
            account and the designs they made stay.
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
