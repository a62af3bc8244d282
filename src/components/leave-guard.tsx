import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';
import { ConfirmDialog } from './ui/dialog';

/**
 * Asks before leaving a page with unsaved changes: inside the app (React Router's useBlocker) and
 * when closing or reloading the tab (the browser's own beforeunload prompt).
 */
export function LeaveGuard({ when, message = 'Your changes have not been saved. If you leave now, they are lost.' }: { when: boolean; message?: string }) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => when && currentLocation.pathname !== nextLocation.pathname,
  );

  useEffect(() => {
    if (!when) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers need returnValue set to show their prompt.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [when]);

  // Saved meanwhile (or discarded): let a pending navigation go on.
  useEffect(() => {
    if (blocker.state === 'blocked' && !when) blocker.proceed();
  }, [blocker, when]);

  return (
    <ConfirmDialog
      open={blocker.state === 'blocked'}
      title="Leave without saving?"
      confirmLabel="Leave and discard"
      cancelLabel="Stay on this page"
      tone="danger"
      onConfirm={() => blocker.proceed?.()}
      onCancel={() => blocker.reset?.()}
    >
      <p>{message}</p>
    </ConfirmDialog>
  );
}
