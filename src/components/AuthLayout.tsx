import type { ReactNode } from 'react';
import { Wordmark } from './Wordmark';

/** The frame for screens used before signing in: sign-in, invitations, password reset. */
export function AuthLayout({ title, intro, children, footer }: { title: string; intro?: ReactNode; children?: ReactNode; footer?: ReactNode }) {
  return (
    <div className="ruled flex min-h-screen items-center justify-center px-4 py-12">
      <div className="w-full max-w-md">
        <div className="mb-8 flex justify-center">
          <Wordmark size="lg" />
        </div>
        <div className="rounded-xl border border-fold bg-paper-card p-8 shadow-sheet">
          <h1 className="text-xl font-semibold text-ink">{title}</h1>
          {intro && <p className="mt-1 text-sm text-ink-soft">{intro}</p>}
          {children && <div className="mt-6">{children}</div>}
        </div>
        {footer && <div className="mt-5 text-center text-sm text-ink-soft">{footer}</div>}
      </div>
    </div>
  );
}
