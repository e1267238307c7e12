import { useEffect, useRef, useState } from 'react';
import { textBlockLabels, type TextBlockKind } from './blockActions';

export interface BlockMenuAdd {
  label: string;
  hint: string;
  run: () => void;
}

/**
 * The block menu: what the current block is, and what can be added at the caret. Opens from the
 * toolbar; arrow keys move through it, Escape closes it.
 */
export function BlockMenu({ current, onText, adds }: { current: TextBlockKind; onText: (kind: TextBlockKind) => void; adds: BlockMenuAdd[] }) {
  const [open, setOpen] = useState(false);
  const menu = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!open) return;
    menu.current?.querySelector<HTMLButtonElement>('[role="menuitem"]')?.focus();
    const close = (event: MouseEvent) => !menu.current?.parentElement?.contains(event.target as Node) && setOpen(false);
    document.addEventListener('mousedown', close);
    return () => document.removeEventListener('mousedown', close);
  }, [open]);

  const choose = (run: () => void) => {
    setOpen(false);
    run();
  };

  const onKeyDown = (event: React.KeyboardEvent) => {
    if (event.key === 'Escape') return setOpen(false);
    if (event.key !== 'ArrowDown' && event.key !== 'ArrowUp') return;
    event.preventDefault();
    const items = [...(menu.current?.querySelectorAll<HTMLButtonElement>('[role="menuitem"]') ?? [])];
    const at = items.indexOf(document.activeElement as HTMLButtonElement);
    items[(at + (event.key === 'ArrowDown' ? 1 : items.length - 1)) % items.length]?.focus();
  };

  const item = 'flex w-full items-baseline justify-between gap-4 rounded px-2.5 py-1.5 text-left text-sm text-ink hover:bg-tide-50 focus:bg-tide-50 focus:outline-none';

  return (
    <div className="relative">
      <button
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        onClick={() => setOpen((was) => !was)}
        className="inline-flex min-w-36 items-center justify-between gap-2 rounded-md border border-fold-strong bg-paper-card px-2.5 py-1 text-sm text-ink hover:border-tide-400"
      >
        <span>{textBlockLabels[current]}</span>
        <span aria-hidden className="text-ink-faint">▾</span>
      </button>
      {open && (
        <div ref={menu} role="menu" aria-label="Block" onKeyDown={onKeyDown} className="absolute left-0 top-full z-30 mt-1 w-72 rounded-md border border-fold bg-paper-card p-1.5 shadow-sheet">
          <p className="px-2.5 pb-1 pt-0.5 text-[11px] font-semibold uppercase tracking-[0.12em] text-ink-faint">Turn this block into</p>
          {(Object.keys(textBlockLabels) as TextBlockKind[]).map((kind) => (
            <button key={kind} type="button" role="menuitem" className={item} onClick={() => choose(() => onText(kind))}>
              <span>{textBlockLabels[kind]}</span>
              {kind === current && <span className="text-xs text-tide-600">current</span>}
            </button>
          ))}
          <p className="mt-1.5 border-t border-fold px-2.5 pb-1 pt-2 text-[11px] font-semibold uppercase tracking-[0.12em] text-ink-faint">Add below the caret</p>
          {adds.map((add) => (
            <button key={add.label} type="button" role="menuitem" className={item} onClick={() => choose(add.run)}>
              <span>{add.label}</span>
              <span className="text-xs text-ink-faint">{add.hint}</span>
            </button>
          ))}
        </div>
      )}
    </div>
  );
}
