import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import { designSchema } from '../../../../shared/schemas/design.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, Input } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { useCreateDesign } from '../api/create-design';
import { newDesign } from '../defaults';
import { numberInput } from '../../../lib/number-input';

/** Name and outer size are all a new design needs; everything else starts from plain defaults. */
const newDesignInput = designSchema.pick({ name: true, outer: true });
type NewDesignInput = z.input<typeof newDesignInput>;

export function NewDesignDialog({
  workshopId,
  open,
  onClose,
  onCreated,
}: {
  workshopId: number;
  open: boolean;
  onClose: () => void;
  onCreated: (design: DesignDto) => void;
}) {
  const create = useCreateDesign(workshopId);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<NewDesignInput>({
    resolver: zodResolver(newDesignInput),
    defaultValues: { name: '', outer: { width: 250, height: 400, depth: 300 } },
  });

  const close = () => {
    reset();
    create.reset();
    onClose();
  };

  const onSubmit = handleSubmit((values) =>
    create.mutateAsync(newDesign(values.name, values.outer)).then(onCreated, (error: unknown) => applyApiError(error, setError)),
  );

  return (
    <Dialog open={open} onClose={close} title="New design">
      <form onSubmit={onSubmit} noValidate className="space-y-4 pt-2">
        <p>Start from the outer size; material, joinery and lining start from plain defaults you can change next.</p>
        {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
        <Field label="Name" error={errors.name?.message}>
          {({ id, invalid }) => <Input id={id} autoFocus invalid={invalid} placeholder="e.g. Study monitor" {...register('name')} />}
        </Field>
        <div className="grid grid-cols-3 gap-3">
          {(['width', 'height', 'depth'] as const).map((key) => (
            <Field key={key} label={key[0]!.toUpperCase() + key.slice(1)} unit="mm" error={errors.outer?.[key]?.message}>
              {({ id, invalid }) => <Input id={id} withUnit invalid={invalid} {...numberInput(register, `outer.${key}`)} />}
            </Field>
          ))}
        </div>
        <div className="flex justify-end gap-2 pt-2">
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" busy={create.isPending}>
            Create design
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
