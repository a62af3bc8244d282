import type { ReactNode } from 'react';
import { isApiError } from '../../lib/api-client';
import { cn } from '../../lib/cn';
import { Alert } from './alert';
import { Button } from './button';

/** Nothing to show yet: a quiet dashed box that says so and, where there is one, what to do next. */
export function EmptyState({ title, children, action, className }: { title: ReactNode; children?: ReactNode; action?: ReactNode; className?: string }) {
  return (
    <div className={cn('rounded-xl border border-dashed border-zinc-300 px-6 py-8 text-center', className)} data-testid="empty-state">
      <p className="text-sm font-bold text-zinc-700">{title}</p>
      {children ? <p className="mx-auto mt-1 max-w-prose text-sm text-zinc-500">{children}</p> : null}
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </div>
  );
}

/** Whether asking again may help: the server could not be reached, was busy, or failed. */
export function isRetryable(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return error.status === 0 || error.status === 429 || error.status >= 500;
}

/** A list or page that could not load: the server's plain message, and Try again when that may help. */
export function LoadError({ what, error, onRetry, className }: { what: string; error: unknown; onRetry?: () => void; className?: string }) {
  return (
    <Alert
      tone="error"
      title={`Could not load ${what}`}
      className={className}
      actions={onRetry && isRetryable(error) ? <Button onClick={onRetry}>Try again</Button> : undefined}
    >
      {isApiError(error) ? error.message : 'Something went wrong. Please try again.'}
    </Alert>
  );
}
