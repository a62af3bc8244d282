import { cn } from '../../lib/cn';

export function Spinner({ label = 'Loading…', className }: { label?: string; className?: string }) {
  return (
    <div role="status" className={cn('flex items-center gap-2 text-sm text-zinc-500', className)}>
      <span className="size-4 animate-spin rounded-full border-2 border-zinc-300 border-r-accent-600" />
      {label}
    </div>
  );
}
