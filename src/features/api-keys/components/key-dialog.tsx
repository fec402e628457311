import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A modal for a key form (native <dialog>: focus stays inside, Escape closes, focus goes back to
 * the opener unless the caller moves it on, as after a key is made).
 */
export function KeyDialog({ open, title, onClose, children }: { open: boolean; title: string; onClose: () => void; children: (titleId: string) => ReactNode }) {
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
      className="m-auto max-h-[calc(100dvh-2rem)] w-[calc(100%-1.5rem)] max-w-xl overflow-y-auto rounded-2xl border border-ink-200 bg-paper-50 p-0 text-ink-950 shadow-xl backdrop:bg-ink-950/50"
    >
      <div className="p-5 sm:p-6">
        <h2 id={titleId} className="text-lg font-extrabold tracking-tight">
          {title}
        </h2>
        {open && children(titleId)}
      </div>
    </dialog>
  );
}
