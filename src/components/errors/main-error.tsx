import { Button } from '../ui/button';

/** Last-resort screen when the app itself crashed (the root error boundary). */
export function MainErrorFallback() {
  return (
    <div role="alert" className="flex min-h-screen flex-col items-center justify-center gap-4 px-6 text-center">
      <h1 className="text-xl font-bold text-zinc-900">Something went wrong</h1>
      <p className="max-w-md text-sm text-zinc-600">
        The page stopped working. Your saved designs are safe; reloading usually helps.
      </p>
      <Button variant="primary" onClick={() => window.location.reload()}>
        Reload the page
      </Button>
    </div>
  );
}
