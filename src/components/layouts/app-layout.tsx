import type { ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { cn } from '../../lib/cn';
import { Brand } from './brand';

export interface AppLayoutProps {
  homeHref: string;
  workshopName?: string;
  roleLabel?: string;
  /** Shown when the user belongs to more than one workshop. */
  switchWorkshopHref?: string;
  /** The workshop's pages; an item is marked current when the path starts with `to` or with one of `alsoFor`. */
  nav: Array<{ to: string; label: string; alsoFor?: RegExp }>;
  userEmail: string;
  onSignOut: () => void;
  signingOut?: boolean;
  children: ReactNode;
}

/** Whether a nav item is the current page: its own path or below it, or a path it also stands for. */
export function isCurrent(item: { to: string; alsoFor?: RegExp }, pathname: string): boolean {
  return pathname === item.to || pathname.startsWith(`${item.to}/`) || (item.alsoFor?.test(pathname) ?? false);
}

/**
 * The signed-in frame. Two rows so nothing is cut off on a tablet: a sticky bar (56 px + its 1 px border,
 * which the design page's save bar sits under) with the workshop, the user and sign-out, and below it the
 * workshop's pages as tabs that scroll away with the page.
 */
export function AppLayout({
  homeHref,
  workshopName,
  roleLabel,
  switchWorkshopHref,
  nav,
  userEmail,
  onSignOut,
  signingOut,
  children,
}: AppLayoutProps) {
  const { pathname } = useLocation();
  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only rounded-md bg-white px-3 py-2 text-sm text-accent-800 shadow focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50"
      >
        Skip to the page
      </a>
      <header className="sticky top-0 z-30 border-b border-zinc-200 bg-white/95 backdrop-blur">
        <div className="mx-auto flex h-14 max-w-[1400px] items-center gap-4 px-6">
          <Link to={homeHref} className="shrink-0 rounded-md" aria-label="Boxwright, start">
            <Brand />
          </Link>
          {workshopName ? (
            <div className="flex min-w-0 items-center gap-2 border-l border-zinc-200 pl-4">
              <span className="truncate text-sm font-bold text-zinc-800" data-testid="workshop-name" title={workshopName}>
                {workshopName}
              </span>
              {roleLabel ? (
                <span className="shrink-0 rounded-full bg-zinc-100 px-2 py-0.5 text-xs text-zinc-600" data-testid="role-label">
                  {roleLabel}
                </span>
              ) : null}
              {switchWorkshopHref ? (
                <Link to={switchWorkshopHref} className="shrink-0 rounded text-xs text-accent-700 hover:underline">
                  Switch workshop
                </Link>
              ) : null}
            </div>
          ) : null}
          <div className="ml-auto flex min-w-0 items-center gap-3">
            <span className="hidden truncate text-sm text-zinc-600 md:inline" data-testid="user-email" title={userEmail}>
              {userEmail}
            </span>
            <button
              type="button"
              onClick={onSignOut}
              disabled={signingOut}
              className="h-8 shrink-0 rounded-md border border-zinc-300 px-2.5 text-sm whitespace-nowrap text-zinc-700 hover:bg-zinc-50 disabled:opacity-50"
            >
              Sign out
            </button>
          </div>
        </div>
      </header>
      {nav.length > 0 ? (
        <div className="border-b border-zinc-200 bg-white">
          <nav className="mx-auto flex max-w-[1400px] gap-1 overflow-x-auto px-4" aria-label="Workshop">
            {nav.map((item) => {
              const current = isCurrent(item, pathname);
              return (
                <Link
                  key={item.to}
                  to={item.to}
                  aria-current={current ? 'page' : undefined}
                  className={cn(
                    // The row scrolls sideways on narrow screens, which would clip an outside focus ring: draw it inside.
                    '-mb-px rounded-t border-b-2 px-3 py-2.5 text-sm whitespace-nowrap focus-visible:-outline-offset-2',
                    current ? 'border-accent-600 text-accent-800' : 'border-transparent text-zinc-600 hover:border-zinc-300 hover:text-zinc-900',
                  )}
                >
                  {item.label}
                </Link>
              );
            })}
          </nav>
        </div>
      ) : null}
      <main id="main" tabIndex={-1} className="mx-auto max-w-[1400px] px-6 py-8 focus:outline-none">
        {children}
      </main>
    </div>
  );
}

/** Title row of a page: heading, a line of context, and the page's main actions. */
export function PageHeader({ title, description, actions, back }: { title: ReactNode; description?: ReactNode; actions?: ReactNode; back?: ReactNode }) {
  return (
    <div className="mb-6">
      {back ? <div className="mb-2 text-sm">{back}</div> : null}
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="min-w-0">
          <h1 className="text-xl font-bold text-zinc-900">{title}</h1>
          {description ? <p className="mt-1 text-sm text-zinc-500">{description}</p> : null}
        </div>
        {actions ? <div className="flex items-center gap-2">{actions}</div> : null}
      </div>
    </div>
  );
}
