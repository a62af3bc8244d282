import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

export type AlertTone = 'info' | 'warning' | 'error' | 'success';

const tones: Record<AlertTone, string> = {
  info: 'border-zinc-200 bg-white text-zinc-700',
  warning: 'border-amber-300 bg-amber-50 text-amber-900',
  error: 'border-red-300 bg-red-50 text-red-900',
  success: 'border-accent-200 bg-accent-50 text-accent-800',
};

export function Alert({
  tone = 'info',
  title,
  children,
  actions,
  className,
}: {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={cn('rounded-lg border px-4 py-3 text-sm', tones[tone], className)}>
      {title ? <p className="font-bold">{title}</p> : null}
      {children ? <div className={cn(title ? 'mt-1' : undefined)}>{children}</div> : null}
      {actions ? <div className="mt-3 flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
