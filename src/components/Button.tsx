import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';

type Tone = 'primary' | 'secondary' | 'quiet' | 'danger';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-55';

const tones: Record<Tone, string> = {
  primary: 'bg-tide-600 text-paper-card hover:bg-tide-700 shadow-sm',
  secondary: 'border border-fold-strong bg-paper-card text-ink hover:border-tide-400 hover:text-tide-700',
  quiet: 'text-tide-700 hover:bg-tide-50',
  danger: 'border border-ember-100 bg-ember-50 text-ember-700 hover:bg-ember-100',
};

export function buttonClass(tone: Tone = 'primary', extra = ''): string {
  return `${base} ${tones[tone]} ${extra}`.trim();
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  tone?: Tone;
  busy?: boolean;
}

export function Button({ tone = 'primary', busy = false, className = '', disabled, children, type = 'button', ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClass(tone, className)} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy && <span className="size-3 animate-spin rounded-full border-2 border-current border-r-transparent" aria-hidden />}
      {children}
    </button>
  );
}

export function ButtonLink({ tone = 'secondary', className = '', ...rest }: LinkProps & { tone?: Tone }) {
  return <Link className={buttonClass(tone, className)} {...rest} />;
}
