import { dismiss, useNotices } from '../../lib/notify';
import { cn } from '../../lib/cn';

/** Shows lib/notify notices in the bottom-right corner. */
export function Toaster() {
  const notices = useNotices();
  return (
    <div aria-live="polite" className="pointer-events-none fixed right-4 bottom-4 z-50 flex w-80 flex-col gap-2">
      {notices.map((n) => (
        <div
          key={n.id}
          role={n.tone === 'error' ? 'alert' : 'status'}
          className={cn(
            'pointer-events-auto flex items-start gap-3 rounded-lg border bg-white px-4 py-3 text-sm shadow-lg',
            n.tone === 'error' ? 'border-red-200 text-red-900' : 'border-zinc-200 text-zinc-800',
          )}
        >
          <span
            className={cn(
              'mt-1.5 size-2 shrink-0 rounded-full',
              n.tone === 'error' ? 'bg-red-600' : n.tone === 'success' ? 'bg-accent-600' : 'bg-zinc-400',
            )}
          />
          <p className="flex-1">{n.message}</p>
          <button
            type="button"
            onClick={() => dismiss(n.id)}
            className="-mr-1 rounded px-1 text-zinc-400 hover:text-zinc-700"
            aria-label="Dismiss"
          >
            ×
          </button>
        </div>
      ))}
    </div>
  );
}
