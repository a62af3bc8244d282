import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { workshopCreateInput, type WorkshopDto } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, Input } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { useCreateWorkshop } from '../api/workshop-settings';

/** "New workshop" on the picker: a name, and the person who starts it becomes its owner. */
export function NewWorkshopForm({ onCreated, startOpen = false }: { onCreated: (w: WorkshopDto) => void; startOpen?: boolean }) {
  const [open, setOpen] = useState(startOpen);
  const create = useCreateWorkshop();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<{ name: string }>({ resolver: zodResolver(workshopCreateInput), defaultValues: { name: '' } });

  if (!open) {
    return (
      <Button className="w-full" onClick={() => setOpen(true)}>
        New workshop
      </Button>
    );
  }
  const submit = handleSubmit((values) => create.mutate(values.name, { onSuccess: onCreated, onError: (error) => applyApiError(error, setError) }));
  return (
    <form onSubmit={submit} noValidate className="space-y-3 rounded-lg border border-zinc-200 p-4" aria-label="New workshop">
      <p className="text-sm text-zinc-600">Start a workshop of your own: you will be its owner and can invite others.</p>
      <Field label="Workshop name" error={errors.name?.message}>
        {(p) => <Input id={p.id} invalid={p.invalid} aria-describedby={p.describedBy} maxLength={120} autoFocus {...register('name')} />}
      </Field>
      {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
      <div className="flex justify-end gap-2">
        <Button
          variant="ghost"
          onClick={() => {
            reset();
            setOpen(false);
          }}
        >
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create workshop
        </Button>
      </div>
    </form>
  );
}
