import type { ReactNode } from 'react';
import { ConfirmDialog } from '../ui/dialog';

/** A delete mutation keyed by the row's id (TanStack Query's `useMutation` result fits). */
export interface DeleteMutation {
  mutate(id: number, options?: { onSuccess?: () => void }): void;
  isPending: boolean;
  error: { message: string } | null;
  reset(): void;
}

/**
 * "Delete this …?" for one row of a table: open while `item` is set; the button shows progress, a failure is
 * said inside the dialog (the mutation has `meta: { inlineErrors: true }`), Cancel or Escape closes it and
 * forgets the failure. After a delete `onDeleted` runs, then `onClose`.
 */
export function ConfirmDeleteDialog<T extends { id: number }>({
  item,
  title,
  confirmLabel,
  mutation,
  onClose,
  onDeleted,
  children,
}: {
  item: T | null;
  title: ReactNode;
  confirmLabel: string;
  mutation: DeleteMutation;
  onClose: () => void;
  onDeleted?: (item: T) => void;
  /** What will go, in plain words. */
  children: (item: T) => ReactNode;
}) {
  return (
    <ConfirmDialog
      open={item !== null}
      title={title}
      confirmLabel={confirmLabel}
      tone="danger"
      busy={mutation.isPending}
      error={mutation.error?.message}
      onCancel={() => {
        mutation.reset();
        onClose();
      }}
      onConfirm={() => {
        if (!item) return;
        mutation.mutate(item.id, {
          onSuccess: () => {
            onDeleted?.(item);
            onClose();
          },
        });
      }}
    >
      {item ? children(item) : null}
    </ConfirmDialog>
  );
}
