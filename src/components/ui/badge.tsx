import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

export function Badge({ children, tone = 'neutral' }: { children: ReactNode; tone?: 'neutral' | 'accent' | 'warning' }) {
  return (
    <span
      className={cn(
        'inline-flex items-center rounded-full px-2 py-0.5 text-xs',
        tone === 'neutral' && 'bg-zinc-100 text-zinc-700',
        tone === 'accent' && 'bg-accent-50 text-accent-700 ring-1 ring-accent-200 ring-inset',
        tone === 'warning' && 'bg-amber-50 text-amber-800 ring-1 ring-amber-200 ring-inset',
      )}
    >
      {children}
    </span>
  );
}
