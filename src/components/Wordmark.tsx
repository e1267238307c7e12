/** Quillane's mark: a nib stroke crossing a corner rule, as on a squared notebook sheet. */
export function Wordmark({ size = 'md', inverted = false }: { size?: 'md' | 'lg'; inverted?: boolean }) {
  const box = size === 'lg' ? 'size-10' : 'size-8';
  const text = size === 'lg' ? 'text-2xl' : 'text-lg';
  return (
    <span className="inline-flex items-center gap-2.5">
      <svg viewBox="0 0 32 32" className={box} aria-hidden>
        <rect width="32" height="32" rx="7" fill={inverted ? '#f7f5ef' : '#21443d'} />
        <path d="M9 23 23 9" stroke="#c9952c" strokeWidth="3" strokeLinecap="round" />
        <path d="M9 15.5h7M16.5 23v-7" stroke={inverted ? '#21443d' : '#f4f1e8'} strokeWidth="2.2" strokeLinecap="round" />
      </svg>
      <span className={`${text} font-semibold tracking-tight ${inverted ? 'text-paper' : 'text-tide-700'}`}>Quillane</span>
    </span>
  );
}
