import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { z } from 'zod';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import { designSchema } from '../../../../shared/schemas/design.schema';
import type { LengthUnit } from '../../../../shared/units/index';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, Input } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { useCreateDesign } from '../api/create-design';
import { newDesign, startingOuter } from '../defaults';
import { LengthField, lengthUnitHint, LengthUnitContext } from './fields';

/** Name and outer size are all a new design needs; everything else starts from plain defaults. */
const newDesignInput = designSchema.pick({ name: true, outer: true });
type NewDesignInput = z.input<typeof newDesignInput>;

/**
 * "New design": a name and the outer size in the user's unit (typed in either unit, as in the design form's
 * length boxes); the design is stored in millimetres.
 */
export function NewDesignDialog({
  workshopId,
  units,
  open,
  onClose,
  onCreated,
}: {
  workshopId: number;
  units: LengthUnit;
  open: boolean;
  onClose: () => void;
  onCreated: (design: DesignDto) => void;
}) {
  const create = useCreateDesign(workshopId);
  const form = useForm<NewDesignInput>({
    resolver: zodResolver(newDesignInput),
    defaultValues: { name: '', outer: startingOuter(units) },
  });
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = form;

  // Each opening starts afresh, from the starting size in the unit the user has now.
  useEffect(() => {
    if (open) reset({ name: '', outer: startingOuter(units) });
  }, [open, units, reset]);

  const close = () => {
    create.reset();
    onClose();
  };

  const onSubmit = handleSubmit((values) =>
    create.mutateAsync(newDesign(values.name, values.outer)).then(onCreated, (error: unknown) => applyApiError(error, setError)),
  );

  return (
    <Dialog open={open} onClose={close} title="New design">
      <FormProvider {...form}>
        <LengthUnitContext.Provider value={units}>
          <form onSubmit={onSubmit} noValidate className="space-y-4 pt-2">
            <p>
              Start from the outer size; material, joinery and lining take plain defaults you can change next.{' '}
              {lengthUnitHint(units)}
            </p>
            {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
            <Field label="Name" error={errors.name?.message}>
              {({ id, invalid }) => <Input id={id} autoFocus invalid={invalid} placeholder="e.g. Study monitor" {...register('name')} />}
            </Field>
            <div className="grid grid-cols-3 gap-3">
              <LengthField name="outer.width" label="Width" />
              <LengthField name="outer.height" label="Height" />
              <LengthField name="outer.depth" label="Depth" />
            </div>
            <div className="flex justify-end gap-2 pt-2">
              <Button onClick={close}>Cancel</Button>
              <Button type="submit" variant="primary" busy={create.isPending}>
                Create design
              </Button>
            </div>
          </form>
        </LengthUnitContext.Provider>
      </FormProvider>
    </Dialog>
  );
}
