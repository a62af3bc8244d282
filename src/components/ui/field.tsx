import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '../../lib/cn';

const control =
  'block w-full rounded-md border bg-white px-2.5 text-sm text-zinc-900 shadow-xs placeholder:text-zinc-400 ' +
  'focus:border-accent-500 focus:outline-none focus:ring-2 focus:ring-accent-100 ' +
  'disabled:bg-zinc-50 disabled:text-zinc-700 disabled:shadow-none';

function controlClasses(invalid: boolean, className?: string) {
  return cn(control, 'h-9', invalid ? 'border-red-600' : 'border-zinc-300', className);
}

export interface FieldProps {
  label: ReactNode;
  /** Shown under the control, in red, and linked with aria-describedby. */
  error?: string;
  hint?: ReactNode;
  /** Unit shown inside the control's right edge (mm, L, Hz, kg/m³). */
  unit?: string;
  className?: string;
  children: (props: { id: string; invalid: boolean; describedBy?: string; unit?: string }) => ReactNode;
}

/** A label, a control and its message, with the ids wired for screen readers. */
export function Field({ label, error, hint, unit, className, children }: FieldProps) {
  const id = useId();
  const messageId = `${id}-message`;
  const message = error ?? hint;
  return (
    <div className={cn('min-w-0', className)}>
      <label htmlFor={id} className="mb-1 block text-[13px] text-zinc-600">
        {label}
      </label>
      <div className="relative">
        {children({ id, invalid: Boolean(error), describedBy: message ? messageId : undefined, unit })}
        {unit ? (
          <span className="pointer-events-none absolute inset-y-0 right-2.5 flex items-center text-xs text-zinc-400">
            {unit}
          </span>
        ) : null}
      </div>
      {message ? (
        <p id={messageId} className={cn('mt-1 text-xs', error ? 'text-red-700' : 'text-zinc-500')} role={error ? 'alert' : undefined}>
          {message}
        </p>
      ) : null}
    </div>
  );
}

export interface InputProps extends InputHTMLAttributes<HTMLInputElement> {
  invalid?: boolean;
  ref?: Ref<HTMLInputElement>;
  /** Leaves room on the right for a unit label. */
  withUnit?: boolean;
}

export function Input({ invalid = false, withUnit, className, ...rest }: InputProps) {
  return (
    <input
      aria-invalid={invalid || undefined}
      className={controlClasses(invalid, cn(withUnit && 'pr-12', className))}
      {...rest}
    />
  );
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  invalid?: boolean;
  ref?: Ref<HTMLSelectElement>;
}

export function Select({ invalid = false, className, children, ...rest }: SelectProps) {
  return (
    <select aria-invalid={invalid || undefined} className={controlClasses(invalid, cn('pr-8', className))} {...rest}>
      {children}
    </select>
  );
}

export interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> {
  label: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function Checkbox({ label, className, ...rest }: CheckboxProps) {
  return (
    <label className={cn('inline-flex cursor-pointer items-center gap-2 text-sm text-zinc-800', className)}>
      <input type="checkbox" className="size-4 rounded border-zinc-300 accent-accent-600" {...rest} />
      {label}
    </label>
  );
}
