import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Field, Input } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useDeleteWorkshop } from '../api/workshop-settings';

/**
 * The danger zone: deleting the workshop and everything in it. The owner types the workshop's name; the
 * server checks it again (400 on `confirmName`) and deletes it all in one transaction.
 */
export function DeleteWorkshop({ workshopId, workshopName, onDeleted }: { workshopId: number; workshopName: string; onDeleted: () => void }) {
  const remove = useDeleteWorkshop(workshopId);
  const [typed, setTyped] = useState('');
  const matches = typed.trim() === workshopName.trim();
  const fieldError = isApiError(remove.error) ? remove.error.fields?.confirmName : undefined;
  const otherError = remove.error && !fieldError ? remove.error.message : undefined;

  return (
    <Card title="Delete this workshop" className="border-red-200!" description="For a workshop that has closed or was started by mistake.">
      <form
        noValidate
        className="space-y-4"
        aria-label="Delete this workshop"
        onSubmit={(e) => {
          e.preventDefault();
          if (matches) remove.mutate(typed, { onSuccess: onDeleted });
        }}
      >
        <Alert tone="warning" title="This cannot be undone. Download the cut plans and stock CSV you need first.">
          Its designs, builds, cut plans and checklists, the stock room, uploaded photos and files, invitations, share links, sent mail and
          history are deleted, and every member loses access to it. People keep their accounts and their other workshops.
        </Alert>
        <div className="flex flex-wrap items-start gap-3">
          <Field label={<>Type <strong className="text-zinc-900">{workshopName}</strong> to confirm</>} error={fieldError} className="w-80">
            {(p) => (
              <Input
                id={p.id}
                invalid={p.invalid}
                aria-describedby={p.describedBy}
                autoComplete="off"
                spellCheck={false}
                value={typed}
                onChange={(e) => setTyped(e.target.value)}
              />
            )}
          </Field>
          <div>
            <span aria-hidden="true" className="mb-1 block text-[13px]">
              &nbsp;
            </span>
            <Button type="submit" variant="danger" disabled={!matches} busy={remove.isPending}>
              Delete workshop
            </Button>
          </div>
        </div>
        {otherError ? <Alert tone="error">{otherError}</Alert> : null}
      </form>
    </Card>
  );
}
