import { useEffect, useId, useRef, type ReactNode } from 'react';

/** A modal dialog on the native <dialog> element (focus trap and Escape come with it). */
export function Dialog({ title, onClose, children }: { title: string; onClose: () => void; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className="w-full max-w-lg rounded-lg border border-fold bg-paper-card p-0 text-ink shadow-sheet backdrop:bg-tide-900/40"
    >
      <header className="flex items-center justify-between border-b border-fold px-5 py-3.5">
        <h2 id={titleId} className="text-base font-semibold">
          {title}
        </h2>
        <button type="button" onClick={onClose} className="text-sm text-ink-soft hover:text-ink" aria-label="Close">
          ✕
        </button>
      </header>
      <div className="p-5">{children}</div>
    </dialog>
  );
}
