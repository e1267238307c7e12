import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { useLexicalEditable } from '@lexical/react/useLexicalEditable';
import { useRef, useState } from 'react';
import type { ReagentRow } from '../../../../shared/editor';
import { HazardNotes } from './HazardNotes';
import { ReagentCaution } from './ReagentCaution';
import { ReagentFacts } from './ReagentFacts';
import { addReagentRow, removeReagentRow, removeReagents, setReagentField, type ReagentTextField } from './reagentEdits';
import { useKeepFormEventsFromEditor } from './keepFromEditor';

const columns: { field: ReagentTextField; label: string; width: string }[] = [
  { field: 'name', label: 'Reagent', width: 'w-32' },
  { field: 'smiles', label: 'SMILES (optional)', width: 'w-28' },
  { field: 'amount', label: 'Amount', width: 'w-16' },
  { field: 'unit', label: 'Unit', width: 'w-14' },
  { field: 'equivalents', label: 'Equiv.', width: 'w-14' },
  // Hazard notes take the remaining width.
  { field: 'hazards', label: 'Hazard notes', width: '' },
];

// Common practice, no source: units a bench chemist weighs, measures or counts reagents in.
const commonUnits = ['mg', 'g', 'kg', 'µL', 'mL', 'L', 'mmol', 'mol', 'drops'];

const field = 'w-full rounded border border-fold-strong bg-paper-card px-1.5 py-1 text-sm text-ink focus:border-tide-400 focus:outline-none focus:ring-1 focus:ring-tide-300';

/**
 * A cell being typed in keeps its own draft and writes it to the shared block when the person
 * leaves the cell (or presses Enter), so each keystroke does not rewrite the whole table for
 * everyone; while not being edited it shows the shared value.
 */
function CellInput({ label, value, multiline, suggestions, onCommit }: { label: string; value: string; multiline?: boolean; suggestions?: string; onCommit: (value: string) => void }) {
  const [draft, setDraft] = useState<string | null>(null);
  const commit = () => {
    if (draft !== null && draft !== value) onCommit(draft);
    setDraft(null);
  };
  const onKeyDown = (event: React.KeyboardEvent<HTMLInputElement | HTMLTextAreaElement>) => {
    if (event.key === 'Enter' && !event.shiftKey) {
      event.preventDefault();
      event.currentTarget.blur();
    } else if (event.key === 'Escape') {
      setDraft(null);
    }
  };
  const shared = {
    'aria-label': label,
    value: draft ?? value,
    onChange: (event: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => setDraft(event.target.value),
    onBlur: commit,
    onKeyDown,
    className: field,
  };
  return multiline ? <textarea rows={2} {...shared} /> : <input type="text" list={suggestions} {...shared} />;
}

function ReadCell({ row, column }: { row: ReagentRow; column: ReagentTextField }) {
  if (column === 'hazards') return <HazardNotes text={row.hazards} />;
  if (column === 'smiles') return <span className="font-mono text-xs break-all">{row.smiles || '—'}</span>;
  return <span>{row[column] || '—'}</span>;
}

/** The reagents of a procedure: amounts, equivalents and the chemist's hazard notes, with the standing caution. */
export function ReagentsBlock({ nodeKey, rows }: { nodeKey: string; rows: ReagentRow[] }) {
  const [editor] = useLexicalComposerContext();
  const editable = useLexicalEditable();
  const container = useRef<HTMLElement>(null);
  useKeepFormEventsFromEditor(container);

  return (
    <section ref={container} data-testid="reagents-block" aria-label="Reagents" className="overflow-hidden rounded-lg border border-fold bg-paper-card shadow-sheet">
      <header className="flex items-center justify-between gap-2 border-b border-fold px-4 py-2">
        <h3 className="text-sm font-semibold text-ink">Reagents</h3>
        {editable && (
          <button type="button" className="rounded px-2 py-1 text-xs font-medium text-ember-700 hover:bg-ember-50" onClick={() => removeReagents(editor, nodeKey)}>
            Remove table
          </button>
        )}
      </header>
      <div className="overflow-x-auto">
        <table className={`w-full table-fixed border-collapse text-left text-sm ${editable ? 'min-w-[52rem]' : 'min-w-[44rem]'}`}>
          <colgroup>
            {columns.map((column) => (
              <col key={column.field} className={column.width || undefined} />
            ))}
            <col className="w-32" />
            {editable && <col className="w-16" />}
          </colgroup>
          <thead className="bg-paper-deep text-xs text-ink-soft">
            <tr>
              {columns.map((column) => (
                <th key={column.field} scope="col" className="px-2 py-1.5 font-medium">
                  {column.label}
                </th>
              ))}
              <th scope="col" className="px-2 py-1.5 font-medium">
                Formula · molar mass
              </th>
              {editable && <th scope="col" className="sr-only">Row actions</th>}
            </tr>
          </thead>
          <tbody>
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns.length + 2} className="px-3 py-3 text-ink-faint">
                  No reagents listed.
                </td>
              </tr>
            )}
            {rows.map((row, index) => (
              <tr key={row.rowKey || index} data-testid="reagent-row" className="border-t border-fold align-top">
                {columns.map((column) => (
                  <td key={column.field} className="px-2 py-1.5" data-column={column.field}>
                    {editable ? (
                      <CellInput
                        label={column.label.replace(' (optional)', '')}
                        value={row[column.field]}
                        multiline={column.field === 'hazards'}
                        suggestions={column.field === 'unit' ? `reagent-units-${nodeKey}` : undefined}
                        onCommit={(value) => setReagentField(editor, nodeKey, row.rowKey, column.field, value.trim())}
                      />
                    ) : (
                      <ReadCell row={row} column={column.field} />
                    )}
                  </td>
                ))}
                <td className="px-2 py-1.5 text-sm break-words">
                  <ReagentFacts smiles={row.smiles} />
                </td>
                {editable && (
                  <td className="px-2 py-1.5">
                    <button type="button" aria-label={`Remove ${row.name || 'this reagent'}`} className="rounded px-1.5 py-1 text-xs text-ember-700 hover:bg-ember-50" onClick={() => removeReagentRow(editor, nodeKey, row.rowKey)}>
                      Remove
                    </button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
        {editable && (
          <datalist id={`reagent-units-${nodeKey}`}>
            {commonUnits.map((unit) => (
              <option key={unit} value={unit} />
            ))}
          </datalist>
        )}
      </div>
      {editable && (
        <div className="border-t border-fold px-4 py-2">
          <button type="button" className="rounded px-2 py-1 text-xs font-medium text-tide-700 hover:bg-tide-50" onClick={() => addReagentRow(editor, nodeKey)}>
            Add a reagent
          </button>
        </div>
      )}
      <ReagentCaution />
    </section>
  );
}
