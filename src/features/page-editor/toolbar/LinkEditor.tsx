import { TOGGLE_LINK_COMMAND } from '@lexical/link';
import type { LexicalEditor } from 'lexical';
import { useId, useState } from 'react';

/** Only links people can follow safely from a notebook page. */
export function safeLinkUrl(raw: string): string | null {
  const text = raw.trim();
  if (text === '') return null;
  const candidate = /^[a-z][a-z0-9+.-]*:/i.test(text) ? text : `https://${text}`;
  try {
    const url = new URL(candidate);
    return ['http:', 'https:', 'mailto:'].includes(url.protocol) ? url.href : null;
  } catch {
    return null;
  }
}

export function LinkEditor({ editor, hasLink, onClose }: { editor: LexicalEditor; hasLink: boolean; onClose: () => void }) {
  const inputId = useId();
  const [value, setValue] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  return (
    <form
      className="absolute left-0 top-full z-20 mt-1 w-80 space-y-2 rounded-md border border-fold bg-paper-card p-3 shadow-sheet"
      onSubmit={(event) => {
        event.preventDefault();
        const url = safeLinkUrl(value);
        if (!url) return setProblem('Give a web or mail address, e.g. https://example.org');
        editor.dispatchCommand(TOGGLE_LINK_COMMAND, url);
        onClose();
      }}
      onKeyDown={(event) => event.key === 'Escape' && onClose()}
    >
      <label htmlFor={inputId} className="block text-xs font-medium text-ink">
        Link address for the selected text
      </label>
      <input
        id={inputId}
        autoFocus
        value={value}
        onChange={(event) => setValue(event.target.value)}
        placeholder="https://"
        className="block w-full rounded border border-fold-strong px-2 py-1 text-sm focus:border-tide-500 focus:outline-none"
      />
      {problem && (
        <p role="alert" className="text-xs text-ember-700">
          {problem}
        </p>
      )}
      <div className="flex justify-end gap-2 text-xs">
        {hasLink && (
          <button
            type="button"
            className="rounded px-2 py-1 text-ember-700 hover:bg-ember-50"
            onClick={() => {
              editor.dispatchCommand(TOGGLE_LINK_COMMAND, null);
              onClose();
            }}
          >
            Remove link
          </button>
        )}
        <button type="button" className="rounded px-2 py-1 text-ink-soft hover:bg-paper-deep" onClick={onClose}>
          Cancel
        </button>
        <button type="submit" className="rounded bg-tide-600 px-2 py-1 font-medium text-paper-card hover:bg-tide-700">
          Apply
        </button>
      </div>
    </form>
  );
}
