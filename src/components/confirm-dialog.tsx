import { useEffect, useId, useRef, type ReactNode } from 'react';
import { dangerButtonClass, primaryButtonClass, secondaryButtonClass } from './form-styles';
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

/**
 * A modal question before a change that is hard to take back. The native <dialog> keeps
 * focus inside, closes on Escape and returns focus to the button that opened it.
 */
export function ConfirmDialog({ open, title, children, confirmLabel, danger, pending, error, onConfirm, onClose }: ConfirmDialogProps) {
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
      aria-labelledby={titleId}
      onClose={onClose}
      className="m-auto w-[calc(100%-2rem)] max-w-md rounded-2xl border border-ink-200 bg-paper-50 p-0 text-ink-950 shadow-xl backdrop:bg-ink-950/50"
    >
      <div className="p-6">
        <h2 id={titleId} className="text-lg font-extrabold tracking-tight">
          {title}
        </h2>
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
      </div>
    </dialog>
  );
}
