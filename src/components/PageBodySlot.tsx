import { Suspense, type ReactNode } from 'react';

function EditorLoading() {
  return (
    <div role="status" aria-live="polite" className="flex min-h-56 flex-col items-center justify-center gap-3 text-sm text-ink-soft">
      <span className="size-5 animate-spin rounded-full border-2 border-tide-400 border-r-transparent" aria-hidden />
      Loading the page editor…
    </div>
  );
}

/**
 * Where a page's body editor is mounted. Routes pass the editor as children (it may be lazy);
 * until something is mounted the region says so instead of pretending to hold content.
 */
export function PageBodySlot({ children }: { children?: ReactNode }) {
  return (
    <div data-slot="page-body" className="ruled min-h-64 rounded-lg border border-fold px-6 py-5">
      <Suspense fallback={<EditorLoading />}>{children ?? <EditorLoading />}</Suspense>
    </div>
  );
}
