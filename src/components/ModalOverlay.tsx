import { useEffect, type DragEventHandler, type ReactNode } from 'react';

/** A modal over the whole screen: Escape or a press on the dimmed backdrop closes it. */
export function ModalOverlay({ labelledBy, onClose, className, onDragOver, onDrop, children }: {
  labelledBy: string;
  onClose: () => void;
  className: string;
  onDragOver?: DragEventHandler<HTMLDivElement>;
  onDrop?: DragEventHandler<HTMLDivElement>;
  children: ReactNode;
}) {
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => event.key === 'Escape' && onClose();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);

  return (
    <div className="fixed inset-0 z-50 grid place-items-center bg-ink/30 p-4" onMouseDown={(event) => event.target === event.currentTarget && onClose()}>
      <div role="dialog" aria-modal="true" aria-labelledby={labelledBy} className={className} onDragOver={onDragOver} onDrop={onDrop}>
        {children}
      </div>
    </div>
  );
}
