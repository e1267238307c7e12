import type { ReactNode } from 'react';

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-fold-strong bg-paper-card/60 px-6 py-10 text-center">
      <svg viewBox="0 0 40 40" className="mx-auto mb-3 size-10 text-tide-300" aria-hidden>
        <rect x="8" y="5" width="24" height="30" rx="3" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M13 13h14M13 19h14M13 25h8" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <h3 className="text-sm font-semibold text-ink">{title}</h3>
      {children && <div className="mx-auto mt-1 max-w-md text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-4 flex justify-center">{action}</div>}
    </div>
  );
}
