/** The warning triangle of our safety cautions. */
export function CautionIcon() {
  return (
    <svg viewBox="0 0 20 20" className="mt-px size-4 shrink-0 text-reed-500" aria-hidden>
      <path d="M10 2.5 18 17H2L10 2.5Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
      <path d="M10 8v4.2M10 14.4v.1" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
    </svg>
  );
}
