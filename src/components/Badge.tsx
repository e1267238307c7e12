import type { ReactNode } from 'react';

export type BadgeTone = 'neutral' | 'tide' | 'reed' | 'heron' | 'ember';

const tones: Record<BadgeTone, string> = {
  neutral: 'bg-paper-deep text-ink-soft ring-fold-strong',
  tide: 'bg-tide-50 text-tide-700 ring-tide-200',
  reed: 'bg-reed-100 text-reed-700 ring-reed-300',
  heron: 'bg-heron-50 text-heron-700 ring-heron-100',
  ember: 'bg-ember-50 text-ember-700 ring-ember-100',
};

export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ReactNode }) {
  return <span className={`inline-flex items-center rounded-full px-2 py-0.5 text-xs font-medium ring-1 ring-inset ${tones[tone]}`}>{children}</span>;
}
