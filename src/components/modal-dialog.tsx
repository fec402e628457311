import { useEffect, useId, useRef, type ReactNode } from 'react';

const widths = { md: 'w-[calc(100%-2rem)] max-w-md', xl: 'w-[calc(100%-1.5rem)] max-w-xl' } as const;

interface ModalDialogProps {
  open: boolean;
  title: string;
  onClose: () => void;
  width?: keyof typeof widths;
  /** Rendered only while open; gets the title's id for forms that name themselves by it. */
  children: (titleId: string) => ReactNode;
}

/**
 * A modal on the native <dialog>: focus stays inside, Escape closes, and focus goes back to the
 * button that opened it unless the caller moves it on.
 */
export function ModalDialog({ open, title, onClose, width = 'md', children }: ModalDialogProps) {
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
      className={`m-auto max-h-[calc(100dvh-2rem)] ${widths[width]} overflow-y-auto rounded-2xl border border-ink-200 bg-paper-50 p-0 text-ink-950 shadow-xl backdrop:bg-ink-950/50`}
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
