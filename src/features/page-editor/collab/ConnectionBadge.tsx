import type { ConnectionPhase } from './connectionState';

const phases: Record<ConnectionPhase, { label: string; hint: string; dot: string; text: string }> = {
  connecting: { label: 'Connecting…', hint: 'Opening the shared page.', dot: 'bg-heron-500 animate-pulse', text: 'text-heron-700' },
  live: { label: 'Live', hint: 'Changes reach everyone on the page as you type.', dot: 'bg-tide-500', text: 'text-tide-700' },
  reconnecting: { label: 'Reconnecting…', hint: 'The connection dropped; trying again.', dot: 'bg-reed-500 animate-pulse', text: 'text-reed-700' },
  'offline-with-edits': {
    label: 'Offline, edits kept here',
    hint: 'Keep writing: your changes stay in this tab and merge when the connection is back. Do not close the tab.',
    dot: 'bg-ember-500',
    text: 'text-ember-700',
  },
  closed: { label: 'Disconnected', hint: 'The server ended the session. Reload the page to continue.', dot: 'bg-ember-500', text: 'text-ember-700' },
};

export function ConnectionBadge({ phase }: { phase: ConnectionPhase }) {
  const shown = phases[phase];
  return (
    <span role="status" aria-live="polite" data-testid="connection-state" data-phase={phase} title={shown.hint} className={`inline-flex items-center gap-1.5 text-xs font-medium ${shown.text}`}>
      <span className={`size-2 rounded-full ${shown.dot}`} aria-hidden />
      {shown.label}
    </span>
  );
}
