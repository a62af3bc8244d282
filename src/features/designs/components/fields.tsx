/**
 * Inputs of the design form, wired to react-hook-form through its context so every section can say
 * just `<NumField name="outer.width" label="Width" unit="mm" />`. Each shows its own error inline.
 */
import type { ReactNode } from 'react';
import { get, useFormContext, type Path, type RegisterOptions } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/schemas/design.schema';
import { Field, Input, Select } from '../../../components/ui/field';
import { parseNumberField } from '../../../lib/number-input';

export type DesignPath = Path<DesignInput>;

function useFieldError(name: string): string | undefined {
  const {
    formState: { errors },
  } = useFormContext<DesignInput>();
  const error = get(errors, name) as { message?: string } | undefined;
  return error?.message;
}

export function NumField({
  name,
  label,
  unit,
  hint,
  placeholder,
  step = 'any',
  className,
  onValueChange,
}: {
  name: DesignPath;
  label: ReactNode;
  unit?: string;
  hint?: ReactNode;
  placeholder?: string;
  step?: number | 'any';
  className?: string;
  onValueChange?: (value: number | undefined) => void;
}) {
  const { register } = useFormContext<DesignInput>();
  const error = useFieldError(name);
  const options: RegisterOptions<DesignInput, DesignPath> = {
    setValueAs: parseNumberField,
    onChange: onValueChange ? (event: { target: { value: string } }) => onValueChange(parseNumberField(event.target.value)) : undefined,
  };
  return (
    <Field label={label} unit={unit} error={error} hint={hint} className={className}>
      {({ id, invalid, describedBy }) => (
        <Input
          id={id}
          type="number"
          inputMode="decimal"
          step={step}
          placeholder={placeholder}
          withUnit={Boolean(unit)}
          invalid={invalid}
          aria-describedby={describedBy}
          data-field={name}
          {...register(name, options)}
        />
      )}
    </Field>
  );
}

export function TextField({
  name,
  label,
  hint,
  placeholder,
  list,
  className,
}: {
  name: DesignPath;
  label: ReactNode;
  hint?: ReactNode;
  placeholder?: string;
  list?: string;
  className?: string;
}) {
  const { register } = useFormContext<DesignInput>();
  const error = useFieldError(name);
  return (
    <Field label={label} error={error} hint={hint} className={className}>
      {({ id, invalid, describedBy }) => (
        <Input
          id={id}
          placeholder={placeholder}
          list={list}
          invalid={invalid}
          aria-describedby={describedBy}
          data-field={name}
          {...register(name)}
        />
      )}
    </Field>
  );
}

export function SelectField<V extends string>({
  name,
  label,
  options,
  hint,
  className,
  onValueChange,
}: {
  name: DesignPath;
  label: ReactNode;
  options: ReadonlyArray<{ value: V; label: string }>;
  hint?: ReactNode;
  className?: string;
  onValueChange?: (value: V) => void;
}) {
  const { register } = useFormContext<DesignInput>();
  const error = useFieldError(name);
  return (
    <Field label={label} error={error} hint={hint} className={className}>
      {({ id, invalid, describedBy }) => (
        <Select
          id={id}
          invalid={invalid}
          aria-describedby={describedBy}
          data-field={name}
          {...register(name, {
            onChange: onValueChange ? (event: { target: { value: string } }) => onValueChange(event.target.value as V) : undefined,
          })}
        >
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}

/** An error about a whole item (e.g. `openings.2`) rather than one of its fields. */
export function ItemError({ name }: { name: string }) {
  const error = useFieldError(name);
  if (!error) return null;
  return (
    <p role="alert" className="mt-2 text-xs text-red-700">
      {error}
    </p>
  );
}

/** A bordered sub-panel for one brace, opening or window, with its title and a remove button. */
export function ItemCard({
  title,
  meta,
  onRemove,
  removeLabel,
  children,
  testId,
}: {
  title: ReactNode;
  meta?: ReactNode;
  onRemove?: () => void;
  removeLabel: string;
  children: ReactNode;
  testId?: string;
}) {
  return (
    <div className="rounded-lg border border-zinc-200 bg-zinc-50/60" data-testid={testId}>
      <div className="flex items-center justify-between gap-3 border-b border-zinc-200 px-4 py-2">
        <p className="text-sm">
          <span className="font-bold text-zinc-900">{title}</span>
          {meta ? <span className="ml-2 text-zinc-500">{meta}</span> : null}
        </p>
        {onRemove ? (
          <button
            type="button"
            onClick={onRemove}
            aria-label={removeLabel}
            className="rounded px-2 py-0.5 text-[13px] text-zinc-500 hover:bg-red-50 hover:text-red-700"
          >
            Remove
          </button>
        ) : null}
      </div>
      <div className="px-4 py-3">{children}</div>
    </div>
  );
}
