import { builtInShortcuts, shortcuts } from './shortcuts';

const isMac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform);

function Keys({ keys }: { keys: string }) {
  return (
    <span className="flex gap-1">
      {keys.split(' ').map((key) => (
        <kbd key={key} className="rounded border border-fold-strong bg-paper px-1.5 font-mono text-[11px] text-ink">
          {key === 'Mod' ? (isMac ? '⌘' : 'Ctrl') : key === 'Alt' && isMac ? '⌥' : key}
        </kbd>
      ))}
    </span>
  );
}

export function ShortcutList() {
  return (
    <div className="absolute right-0 top-full z-30 mt-1 w-72 rounded-md border border-fold bg-paper-card p-3 shadow-sheet" data-testid="shortcut-list">
      <p className="mb-2 text-[11px] font-semibold uppercase tracking-[0.12em] text-ink-faint">Keyboard</p>
      <dl className="space-y-1 text-sm">
        {[...shortcuts, ...builtInShortcuts].map((shortcut) => (
          <div key={shortcut.keys} className="flex items-center justify-between gap-3">
            <dt className="text-ink-soft">{shortcut.does}</dt>
            <dd>
              <Keys keys={shortcut.keys} />
            </dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
