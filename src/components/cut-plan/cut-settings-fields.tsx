import type { FieldValues, Path, UseFormRegister } from 'react-hook-form';
import { Field, Input, Select } from '../ui/field';
import { numberInput } from '../../lib/number-input';

/** The inputs of the cut settings, by their form names (the search time is in seconds). */
export type CutSettingsField = 'kerfMm' | 'trimMm' | 'mode' | 'minOffcutMm' | 'timeLimitS';

/**
 * The five cut settings as the "Make cut plan" form and the workshop's default cut settings show them:
 * kerf, edge trim, cuts (guillotine or free), the smallest offcut kept and the search time. The caller
 * lays them out (they are siblings in its grid) and owns the form.
 */
export function CutSettingsFields<T extends FieldValues>({
  register,
  errors,
  mode,
}: {
  register: UseFormRegister<T>;
  errors: Partial<Record<CutSettingsField, { message?: string }>>;
  /** The mode chosen now (for its hint). */
  mode: unknown;
}) {
  const name = (n: CutSettingsField) => n as Path<T>;
  return (
    <>
      <Field label="Kerf (blade width)" unit="mm" error={errors.kerfMm?.message}>
        {(p) => <Input id={p.id} withUnit invalid={p.invalid} aria-describedby={p.describedBy} {...numberInput(register, name('kerfMm'))} />}
      </Field>
      <Field label="Edge trim" unit="mm" error={errors.trimMm?.message} hint="each side of a sheet">
        {(p) => <Input id={p.id} withUnit invalid={p.invalid} aria-describedby={p.describedBy} {...numberInput(register, name('trimMm'))} />}
      </Field>
      <Field label="Cuts" error={errors.mode?.message} hint={mode === 'free' ? 'any layout: CNC router' : 'edge to edge: panel or table saw'}>
        {(p) => (
          <Select id={p.id} invalid={p.invalid} aria-describedby={p.describedBy} {...register(name('mode'))}>
            <option value="guillotine">Guillotine</option>
            <option value="free">Free</option>
          </Select>
        )}
      </Field>
      <Field label="Keep offcuts from" unit="mm" error={errors.minOffcutMm?.message} hint="both sides at least">
        {(p) => <Input id={p.id} withUnit invalid={p.invalid} aria-describedby={p.describedBy} {...numberInput(register, name('minOffcutMm'))} />}
      </Field>
      <Field label="Search time" unit="s" error={errors.timeLimitS?.message}>
        {(p) => <Input id={p.id} withUnit invalid={p.invalid} aria-describedby={p.describedBy} {...numberInput(register, name('timeLimitS'))} />}
      </Field>
    </>
  );
}
