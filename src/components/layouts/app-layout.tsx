import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { cn } from '../../lib/cn';
import { Brand } from './brand';

export interface AppLayoutProps {
  homeHref: string;
  workshopName?: string;
  roleLabel?: string;
  /** Shown when the user belongs to more than one workshop. */
  switchWorkshopHref?: string;
  nav: Array<{ to: string; label: string }>;
  userEmail: string;
  onSignOut: () => void;
  signingOut?: boolean;
  children: ReactNode;
}

/** The signed-in frame: a header with the workshop, its pages, the user and sign-out. */
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
  return (
    <div className="min-h-screen">
      <header className="sticky top-0 z-30 border-b border-zinc-200 bg-white/95 backdrop-blur">
        <div className="mx-auto flex h-14 max-w-[1400px] items-center gap-6 px-6">
          <Link to={homeHref} className="shrink-0" aria-label="Boxwright, start">
            <Brand />
          </Link>
          {workshopName ? (
            <div className="flex min-w-0 shrink items-center gap-2 border-l border-zinc-200 pl-6">
              <span className="truncate text-sm font-bold text-zinc-800" data-testid="workshop-name">
                {workshopName}
              </span>
              {roleLabel ? <span className="text-xs whitespace-nowrap text-zinc-500">· {roleLabel}</span> : null}
              {switchWorkshopHref ? (
                <Link to={switchWorkshopHref} className="text-xs text-accent-700 hover:underline">
                  Switch
                </Link>
              ) : null}
            </div>
          ) : null}
          <nav className="flex min-w-0 items-center gap-1 overflow-x-auto" aria-label="Workshop">
            {nav.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={false}
                className={({ isActive }) =>
                  cn(
                    'rounded-md px-3 py-1.5 text-sm whitespace-nowrap',
                    isActive ? 'bg-accent-50 text-accent-800' : 'text-zinc-600 hover:bg-zinc-100 hover:text-zinc-900',
                  )
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <span className="hidden text-sm text-zinc-600 xl:inline" data-testid="user-email">
              {userEmail}
            </span>
            <button
              type="button"
              onClick={onSignOut}
              disabled={signingOut}
              className="shrink-0 rounded-md border border-zinc-300 px-2.5 py-1 text-sm whitespace-nowrap text-zinc-700 hover:bg-zinc-50 disabled:opacity-50"
            >
              Sign out
            </button>
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-[1400px] px-6 py-8">{children}</main>
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
