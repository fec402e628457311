import type { ReactNode } from 'react';
import { dangerButtonClass, primaryButtonClass, secondaryButtonClass } from './form-styles';
import { ModalDialog } from './modal-dialog';
import { Notice } from './notice';

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  danger?: boolean;
  pending?: boolean;
  error?: string;
  onConfirm: () => void;
  onClose: () => void;
}

/** A modal question before a change that is hard to take back. */
export function ConfirmDialog({ open, title, children, confirmLabel, danger, pending, error, onConfirm, onClose }: ConfirmDialogProps) {
  return (
    <ModalDialog open={open} title={title} onClose={onClose}>
      {() => (
        <>
          <div className="mt-2 text-sm leading-relaxed text-ink-800">{children}</div>
          {error && (
            <div className="mt-4">
              <Notice tone="error">{error}</Notice>
            </div>
          )}
          <div className="mt-6 flex flex-wrap justify-end gap-3">
            <button type="button" className={secondaryButtonClass} onClick={onClose}>
              Cancel
            </button>
            <button type="button" className={danger ? dangerButtonClass : primaryButtonClass} onClick={onConfirm} disabled={pending}>
              {pending ? 'Working…' : confirmLabel}
            </button>
          </div>
        </>
      )}
    </ModalDialog>
  );
}
