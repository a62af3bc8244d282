import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { buildInput, type BuildDto, type BuildInput } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Checkbox, Field, Input, Select } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { numberInput } from '../../../lib/number-input';
import { useSaveBuild } from '../api/save-build';

export interface DesignChoice {
  id: number;
  name: string;
}

/**
 * New build, or edit one: a name and lines of design × quantity, each optionally a mirrored pair (half the
 * cabinets are built as the mirror image, for the left and right of a pair).
 */
export function BuildDialog({
  workshopId,
  designs,
  existing,
  open,
  onClose,
  onSaved,
}: {
  workshopId: number;
  designs: DesignChoice[];
  existing?: BuildDto;
  open: boolean;
  onClose: () => void;
  onSaved: (build: BuildDto) => void;
}) {
  const save = useSaveBuild(workshopId, existing ? { id: existing.id, version: existing.version } : undefined);
  const defaults = (): BuildInput =>
    existing
      ? { name: existing.name, notes: existing.notes, items: existing.items.map(({ designId, quantity, mirroredPair }) => ({ designId, quantity, mirroredPair })) }
      : { name: '', notes: '', items: designs[0] ? [{ designId: designs[0].id, quantity: 2, mirroredPair: false }] : [] };
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<BuildInput>({ resolver: zodResolver(buildInput), defaultValues: defaults() });
  const items = useFieldArray({ control, name: 'items' });

  useEffect(() => {
    if (open) reset(defaults());
    // Only when the dialog opens: later edits of `existing` must not wipe what is being typed.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open]);

  const close = () => {
    save.reset();
    onClose();
  };
  const onSubmit = handleSubmit((values) => save.mutateAsync(values).then(onSaved, (error: unknown) => applyApiError(error, setError)));

  return (
    <Dialog open={open} onClose={close} title={existing ? 'Edit build' : 'New build'} wide>
      <form onSubmit={onSubmit} noValidate className="space-y-4 pt-2">
        <p>A build is the cabinets you make together: pick the designs and how many of each. A pair is 2.</p>
        {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
        <Field label="Name" error={errors.name?.message}>
          {({ id, invalid }) => <Input id={id} autoFocus invalid={invalid} placeholder="e.g. Studio pair" {...register('name')} />}
        </Field>
        <fieldset className="space-y-2">
          <legend className="mb-1 text-[13px] text-zinc-600">Cabinets</legend>
          {items.fields.map((field, i) => (
            <div key={field.id} className="grid grid-cols-[1fr_6rem] items-start gap-x-2 gap-y-1 rounded-lg border border-zinc-200 p-2" data-testid="build-line">
              <Field label="Design" error={errors.items?.[i]?.designId?.message}>
                {({ id, invalid }) => (
                  <Select id={id} invalid={invalid} {...register(`items.${i}.designId`, { valueAsNumber: true })}>
                    {designs.map((d) => (
                      <option key={d.id} value={d.id}>
                        {d.name}
                      </option>
                    ))}
                  </Select>
                )}
              </Field>
              <Field label="Quantity" error={errors.items?.[i]?.quantity?.message}>
                {({ id, invalid }) => <Input id={id} invalid={invalid} {...numberInput(register, `items.${i}.quantity`, 1)} min={1} />}
              </Field>
              <div className="col-span-2 flex items-center justify-between gap-2">
                <Checkbox label="Mirrored pair (half of them the mirror image)" {...register(`items.${i}.mirroredPair`)} />
                <Button size="sm" variant="ghost" aria-label={`Remove line ${i + 1}`} onClick={() => items.remove(i)} disabled={items.fields.length === 1}>
                  Remove
                </Button>
              </div>
            </div>
          ))}
          {typeof errors.items?.message === 'string' ? <p className="text-xs text-red-700">{errors.items.message}</p> : null}
          <Button size="sm" onClick={() => items.append({ designId: designs[0]?.id ?? 0, quantity: 1, mirroredPair: false })} disabled={designs.length === 0}>
            Add a design
          </Button>
        </fieldset>
        <Field label="Notes" error={errors.notes?.message} hint="Optional: finish, who it is for, a date.">
          {({ id, invalid }) => <Input id={id} invalid={invalid} {...register('notes')} />}
        </Field>
        <div className="flex justify-end gap-2 pt-2">
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" busy={save.isPending}>
            {existing ? 'Save build' : 'Create build'}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
