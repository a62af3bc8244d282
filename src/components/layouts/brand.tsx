/** Boxwright's own mark: a box outline with a round cut-out. */
export function BrandMark({ className = 'size-6' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="5" y="7" width="22" height="20" rx="2" fill="none" stroke="currentColor" strokeWidth="2.5" />
      <circle cx="16" cy="17" r="4" fill="currentColor" />
    </svg>
  );
}

export function Brand() {
  return (
    <span className="inline-flex items-center gap-2 text-accent-700">
      <BrandMark />
      <span className="text-[17px] font-bold tracking-tight text-zinc-900">Boxwright</span>
    </span>
  );
}
