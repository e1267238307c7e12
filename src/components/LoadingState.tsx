export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-10 text-sm text-ink-soft">
      <span className="size-4 animate-spin rounded-full border-2 border-tide-400 border-r-transparent" aria-hidden />
      {label}
    </div>
  );
}
