import { BrandMark } from './brand';

/** While the app opens (the first page's data is loading): the mark and a quiet line, centred. */
export function AppLoading() {
  return (
    <div role="status" className="flex min-h-screen flex-col items-center justify-center gap-3 text-sm text-zinc-500">
      <BrandMark className="size-8 animate-pulse text-accent-600" />
      Opening Boxwright…
    </div>
  );
}
