import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { stockInput, type StockInput, type StockItemDto, type StockValues } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, Input, Select } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { numberInput, parseNumberField } from '../../../lib/number-input';
import { useSaveStockItem } from '../api/stock';

const EMPTY: StockInput = { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, lengthMm: null, quantity: null, cost: null, grain: 'none', note: '' };

/** An empty box is null here: "unlimited" quantity, no price, as much roll as needed. */
const nullable = (v: unknown) => parseNumberField(v) ?? null;

/** Add or edit one sheet, remnant or roll; server errors land next to their fields. */
export function StockFormDialog({ workshopId, item, open, onClose }: { workshopId: number; item: StockItemDto | null; open: boolean; onClose: () => void }) {
  const save = useSaveStockItem(workshopId);
  const form = useForm<StockInput, unknown, StockValues>({
    resolver: zodResolver(stockInput),
    values: item ? { ...item } : EMPTY,
    resetOptions: { keepDirtyValues: false },
  });
  const { register, handleSubmit, watch, setError, formState } = form;
  const kind = watch('kind');
  const errors = formState.errors;

  const submit = handleSubmit((values) =>
    save.mutate(
      { id: item?.id, version: item?.version, item: values },
      { onSuccess: () => onClose(), onError: (error) => applyApiError(error, setError) },
    ),
  );

  return (
    <Dialog
      open={open}
      onClose={onClose}
      wide
      title={item ? `Edit ${item.kind}` : 'Add to the stock room'}
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button variant="primary" type="submit" form="stock-form" busy={save.isPending}>
            {item ? 'Save' : 'Add'}
          </Button>
        </>
      }
    >
      <form id="stock-form" onSubmit={submit} className="grid grid-cols-2 gap-3 pt-2" noValidate>
        <Field label="Kind" error={errors.kind?.message}>
          {(p) => (
            <Select id={p.id} invalid={p.invalid} {...register('kind')}>
              <option value="sheet">Sheet</option>
              <option value="remnant">Remnant (kept offcut)</option>
              <option value="roll">Roll</option>
            </Select>
          )}
        </Field>
        <Field label="Material" error={errors.material?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} {...register('material')} />}
        </Field>
        <Field label="Thickness" unit="mm" error={errors.thicknessMm?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} withUnit {...numberInput(register, 'thicknessMm')} />}
        </Field>
        <Field label={kind === 'roll' ? 'Roll width' : 'Width'} unit="mm" error={errors.widthMm?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} withUnit {...numberInput(register, 'widthMm')} />}
        </Field>
        {kind === 'roll' ? (
          <Field label="Length on the roll" unit="mm" hint="Empty: as much as needed" error={errors.lengthMm?.message}>
            {(p) => <Input id={p.id} invalid={p.invalid} withUnit type="number" inputMode="decimal" step="any" {...register('lengthMm', { setValueAs: nullable })} />}
          </Field>
        ) : (
          <Field label="Height (length of the sheet)" unit="mm" error={errors.heightMm?.message}>
            {(p) => <Input id={p.id} invalid={p.invalid} withUnit type="number" inputMode="decimal" step="any" {...register('heightMm', { setValueAs: nullable })} />}
          </Field>
        )}
        <Field label="Quantity" hint="Empty: unlimited" error={errors.quantity?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} type="number" inputMode="numeric" step={1} {...register('quantity', { setValueAs: nullable })} />}
        </Field>
        <Field label={kind === 'roll' ? 'Cost per metre' : 'Cost each'} hint="Empty: no price" error={errors.cost?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} type="number" inputMode="decimal" step="any" {...register('cost', { setValueAs: nullable })} />}
        </Field>
        <Field label="Grain" error={errors.grain?.message}>
          {(p) => (
            <Select id={p.id} invalid={p.invalid} {...register('grain')}>
              <option value="none">None (parts may turn)</option>
              <option value="length">Along the length</option>
            </Select>
          )}
        </Field>
        <Field label="Note" className="col-span-2" error={errors.note?.message}>
          {(p) => <Input id={p.id} invalid={p.invalid} {...register('note')} />}
        </Field>
        {errors.root?.server ? (
          <p role="alert" className="col-span-2 rounded-md bg-red-50 px-3 py-2 text-sm text-red-800">
            {errors.root.server.message}
          </p>
        ) : null}
      </form>
    </Dialog>
  );
}
