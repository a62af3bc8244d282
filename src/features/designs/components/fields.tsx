/**
 * Inputs of the design form, wired to react-hook-form through its context so every section can say
 * just `<LengthField name="outer.width" label="Width" />`. Each shows its own error inline.
 */
import { createContext, useContext, useEffect, useRef, useState, type ReactNode } from 'react';
import { get, useController, useFormContext, type Path, type RegisterOptions } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/schemas/design.schema';
import type { LengthUnit } from '../../../../shared/units/index';
import { Field, Input, Select } from '../../../components/ui/field';
import { formatLengthInput, parseLengthField } from '../../../lib/length-text';
import { parseNumberField } from '../../../lib/number-input';

/** The unit lengths are shown in (the user's mm/inch choice); every length box accepts either. */
export const LengthUnitContext = createContext<LengthUnit>('mm');
export const useLengthUnit = () => useContext(LengthUnitContext);

export type DesignPath = Path<DesignInput>;

/** What the length boxes take, for a form's description: the shown unit, and that either unit may be typed. */
export function lengthUnitHint(unit: LengthUnit): string {
  return unit === 'in'
    ? 'Lengths in inches; type inches or millimetres (12 3/8, 12.375 in, 314.5 mm).'
    : 'Lengths in millimetres; type millimetres or inches (314.5, 12 3/8").';
}

/** How a message names a box: its label without the letter in brackets, in lower case (`Width (W)` → `width`). */
export function fieldNameOf(label: ReactNode, name: string): string {
  return typeof label === 'string' ? label.replace(/\s*\([^)]*\)$/, '').toLowerCase() : name;
}

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

/**
 * A length in the user's unit: `314.5` or `12 3/8`; typed as `12 3/8"`, `12.375 in`, `314.5 mm` or a bare
 * number in the shown unit. The form holds millimetres; text that is not a length holds NaN, so the form
 * cannot be saved while it shows, and the message names the field and says what to write. Needs a
 * react-hook-form `FormProvider` whose values have `name` (the design form, the New design dialog).
 */
export function LengthField({
  name,
  label,
  hint,
  placeholder,
  className,
}: {
  name: DesignPath;
  label: ReactNode;
  hint?: ReactNode;
  placeholder?: string;
  className?: string;
}) {
  const unit = useLengthUnit();
  const { control, getValues } = useFormContext<DesignInput>();
  const { field, fieldState } = useController({ control, name });
  // The form's own value: the controller's falls back to the default when the value is undefined (an emptied box).
  const stored: unknown = getValues(name);
  const value = typeof stored === 'number' ? stored : undefined;
  const shown = value === undefined || Number.isNaN(value) ? '' : formatLengthInput(value, unit);
  /** What the person is typing; null while the box shows the form's value. */
  const [draft, setDraft] = useState<string | null>(null);
  const [parseError, setParseError] = useState<string | null>(null);
  const inputRef = useRef<HTMLInputElement | null>(null);
  /** The value when the box got the focus: Escape goes back to it. */
  const atFocus = useRef<unknown>(undefined);

  // A value set from outside (the studio, a reset, a reload) replaces a draft the person has left.
  useEffect(() => {
    if (document.activeElement === inputRef.current) return;
    if (value !== undefined && Number.isNaN(value)) return;
    setDraft(null);
    setParseError(null);
  }, [value]);

  const onText = (text: string) => {
    setDraft(text);
    const r = parseLengthField(text, unit, fieldNameOf(label, name));
    if (r.ok) {
      setParseError(null);
      field.onChange(r.mm);
    } else {
      setParseError(r.message);
      field.onChange(Number.NaN);
    }
  };

  return (
    <Field label={label} unit={unit} error={parseError ?? fieldState.error?.message} hint={hint} className={className}>
      {({ id, invalid, describedBy }) => (
        <Input
          id={id}
          type="text"
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          withUnit
          invalid={invalid}
          aria-describedby={describedBy}
          data-field={name}
          name={field.name}
          ref={(el) => {
            inputRef.current = el;
            field.ref(el);
          }}
          value={draft ?? shown}
          onChange={(event) => onText(event.target.value)}
          onFocus={() => {
            atFocus.current = getValues(name);
          }}
          onKeyDown={(event) => {
            if (event.key !== 'Escape' || draft === null) return;
            // Escape cancels what was typed since the box got the focus (a dialog around it is not closed).
            event.preventDefault();
            event.stopPropagation();
            field.onChange(atFocus.current);
            setDraft(null);
            setParseError(null);
          }}
          onBlur={() => {
            field.onBlur();
            // Left with a length in it: show it the way the form writes lengths (`12 3/8 in` → `12 3/8`).
            if (parseError === null) setDraft(null);
          }}
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
