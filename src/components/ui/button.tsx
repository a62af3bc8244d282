import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';
import { cn } from '../../lib/cn';

export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'ghostDanger' | 'danger';
export type ButtonSize = 'sm' | 'md';

const base =
  'inline-flex items-center justify-center gap-1.5 rounded-md font-normal whitespace-nowrap transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-50';
const variants: Record<ButtonVariant, string> = {
  primary: 'bg-accent-600 text-white shadow-sm hover:bg-accent-700 active:bg-accent-800',
  secondary: 'border border-zinc-300 bg-white text-zinc-800 shadow-xs hover:bg-zinc-50 hover:border-zinc-400',
  ghost: 'text-zinc-700 hover:bg-zinc-100 hover:text-zinc-900',
  /** A quiet Delete beside other quiet buttons (`cn` only joins classes: a red className would not win over the ghost's grey). */
  ghostDanger: 'text-red-700 hover:bg-red-50 hover:text-red-800',
  danger: 'bg-red-700 text-white shadow-sm hover:bg-red-800',
};
const sizes: Record<ButtonSize, string> = {
  sm: 'h-8 px-2.5 text-sm',
  md: 'h-9 px-3.5 text-sm',
};

export function buttonClasses(variant: ButtonVariant = 'secondary', size: ButtonSize = 'md', className?: string): string {
  return cn(base, variants[variant], sizes[size], className);
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  busy?: boolean;
}

export function Button({ variant, size, busy, className, disabled, children, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy ? <span className="size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent" /> : null}
      {children}
    </button>
  );
}

export function ButtonLink({
  variant,
  size,
  className,
  ...rest
}: LinkProps & { variant?: ButtonVariant; size?: ButtonSize }) {
  return <Link className={buttonClasses(variant, size, className)} {...rest} />;
}
