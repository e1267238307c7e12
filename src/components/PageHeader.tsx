import type { ReactNode } from 'react';

/** The heading strip of a screen: a small overline (where you are), the title, and actions. */
export function PageHeader({ overline, title, description, actions }: {
  overline?: ReactNode;
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {overline && <div className="mb-1 text-xs font-semibold uppercase tracking-[0.14em] text-tide-500">{overline}</div>}
        <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
        {description && <p className="mt-1 max-w-2xl text-sm text-ink-soft">{description}</p>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </div>
  );
}
