import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

/** A white panel with an optional heading row; the building block of every page. */
export function Card({
  title,
  description,
  actions,
  children,
  className,
  bodyClassName,
  id,
}: {
  title?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
  className?: string;
  bodyClassName?: string;
  id?: string;
}) {
  return (
    <section id={id} className={cn('scroll-mt-20 rounded-xl border border-zinc-200 bg-white shadow-xs', className)}>
      {title || actions ? (
        <header className="flex items-start justify-between gap-4 border-b border-zinc-100 px-5 py-3.5">
          <div className="min-w-0">
            {title ? <h2 className="text-[15px] font-bold text-zinc-900">{title}</h2> : null}
            {description ? <p className="mt-0.5 text-[13px] text-zinc-500">{description}</p> : null}
          </div>
          {actions ? <div className="flex shrink-0 items-center gap-2">{actions}</div> : null}
        </header>
      ) : null}
      <div className={cn('px-5 py-4', bodyClassName)}>{children}</div>
    </section>
  );
}
