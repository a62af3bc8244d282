import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

/**
 * A modal over the native <dialog> element: the browser handles focus trapping, Escape and the
 * backdrop. Controlled by `open`; Escape or a close button calls `onClose`.
 */
export function Dialog({
  open,
  onClose,
  title,
  children,
  footer,
  role = 'dialog',
  wide = false,
}: {
  open: boolean;
  onClose: () => void;
  title: ReactNode;
  children?: ReactNode;
  footer?: ReactNode;
  role?: 'dialog' | 'alertdialog';
  /** 36rem instead of 30rem, for longer choices. */
  wide?: boolean;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      role={role}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={`m-auto ${wide ? 'w-[min(36rem,calc(100vw-2rem))]' : 'w-[min(30rem,calc(100vw-2rem))]'} rounded-xl border border-zinc-200 bg-white p-0 text-zinc-800 shadow-xl`}
    >
      {open ? (
        <div className="px-6 pt-5 pb-5">
          <h2 id={titleId} className="text-base font-bold text-zinc-900">
            {title}
          </h2>
          <div className="mt-2 text-sm text-zinc-600">{children}</div>
          {footer ? <div className="mt-6 flex flex-wrap justify-end gap-2">{footer}</div> : null}
        </div>
      ) : null}
    </dialog>
  );
}

/** "Are you sure?" with a named action; the action button shows progress while it runs. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = 'Cancel',
  tone = 'primary',
  busy,
  error,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: ReactNode;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  tone?: 'primary' | 'danger';
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  return (
    <Dialog
      open={open}
      onClose={onCancel}
      title={title}
      role="alertdialog"
      footer={
        <>
          <Button onClick={onCancel} disabled={busy}>
            {cancelLabel}
          </Button>
          <Button variant={tone === 'danger' ? 'danger' : 'primary'} onClick={onConfirm} busy={busy}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      {children}
      {error ? (
        <p role="alert" className="mt-3 rounded-md bg-red-50 px-3 py-2 text-red-800">
          {error}
        </p>
      ) : null}
    </Dialog>
  );
}
