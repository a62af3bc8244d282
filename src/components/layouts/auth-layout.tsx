import type { ReactNode } from 'react';
import { Brand } from './brand';

/** Sign-in, sign-up and the workshop picker: one centred card on a quiet background. */
export function AuthLayout({ title, subtitle, children, footer }: { title: string; subtitle?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 pt-[12vh] pb-12">
      <title>{`${title} · Boxwright`}</title>
      <Brand />
      <main className="mt-8 w-full max-w-[26rem] rounded-xl border border-zinc-200 bg-white px-8 py-7 shadow-sm">
        <h1 className="text-lg font-bold text-zinc-900">{title}</h1>
        {subtitle ? <p className="mt-1 text-sm text-zinc-500">{subtitle}</p> : null}
        <div className="mt-6">{children}</div>
      </main>
      {footer ? <div className="mt-5 text-sm text-zinc-600">{footer}</div> : null}
    </div>
  );
}
