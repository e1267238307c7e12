import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { useLexicalEditable } from '@lexical/react/useLexicalEditable';
import { $getNodeByKey } from 'lexical';
import { useState } from 'react';
import type { NameStyle } from '../../../../shared/chem';
import type { StructureFields } from '../../../../shared/editor';
import { useStructureDescription } from '../api/queries';
import { useEditorEnvironment } from '../EditorEnvironment';
import { NameExplanation } from './NameExplanation';
import { StructureDrawing } from './StructureDrawing';
import { StructureFacts } from './StructureFacts';

const styles: { value: NameStyle; label: string }[] = [
  { value: 'preferred', label: 'Preferred' },
  { value: 'traditional', label: 'Traditional' },
];

const smallButton = 'rounded px-2 py-1 text-xs font-medium text-tide-700 hover:bg-tide-50';

/** One structure on the page: drawing, computed name (never a guess), formula and masses. */
export function StructureBlock({ nodeKey, fields }: { nodeKey: string; fields: StructureFields }) {
  const [editor] = useLexicalComposerContext();
  const editable = useLexicalEditable();
  const { openStructureDialog } = useEditorEnvironment();
  const [style, setStyle] = useState<NameStyle>('preferred');
  const [explaining, setExplaining] = useState(false);
  const description = useStructureDescription(fields.molfile, style);
  const naming = description.data?.naming;
  const explanation = explaining && naming?.ok ? naming.explanation : null;

  const remove = () => editor.update(() => $getNodeByKey(nodeKey)?.remove());

  return (
    <figure
      id={`structure-${fields.structureKey}`}
      data-testid="structure-block"
      tabIndex={-1}
      className="rounded-lg border border-fold bg-paper-card shadow-sheet outline-none transition-shadow focus:ring-2 focus:ring-reed-300"
    >
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-fold px-4 py-2">
        <figcaption className="text-sm font-semibold text-ink" data-testid="structure-label">
          {fields.label || 'Structure'}
        </figcaption>
        <div className="flex items-center gap-1">
          <div role="group" aria-label="Name style" className="mr-2 inline-flex rounded-md border border-fold-strong p-0.5">
            {styles.map((option) => (
              <button
                key={option.value}
                type="button"
                aria-pressed={style === option.value}
                onClick={() => setStyle(option.value)}
                className={`rounded px-2 py-0.5 text-xs ${style === option.value ? 'bg-tide-600 text-paper-card' : 'text-ink-soft hover:text-tide-700'}`}
              >
                {option.label}
              </button>
            ))}
          </div>
          {naming?.ok && (
            <button type="button" className={smallButton} aria-pressed={explaining} onClick={() => setExplaining((on) => !on)}>
              {explaining ? 'Hide reasons' : 'Why this name?'}
            </button>
          )}
          {editable && (
            <>
              <button type="button" className={smallButton} onClick={() => openStructureDialog({ mode: 'redraw', nodeKey, fields })}>
                Redraw
              </button>
              <button type="button" className="rounded px-2 py-1 text-xs font-medium text-ember-700 hover:bg-ember-50" onClick={remove}>
                Remove
              </button>
            </>
          )}
        </div>
      </header>
      <div className="flex flex-wrap items-start gap-5 px-4 py-3">
        <StructureDrawing molfile={fields.molfile} explanation={explanation} label={fields.label} />
        <div className="min-w-56 flex-1 space-y-3">
          {description.isPending && <p className="text-sm text-ink-soft">Naming…</p>}
          {description.isError && (
            <p role="alert" className="text-sm text-ember-700">
              This structure could not be read: {description.error.message}
            </p>
          )}
          {description.data && (
            <>
              {naming?.ok ? (
                <p className="text-base font-medium break-words text-ink" data-testid="structure-name">
                  {naming.name}
                </p>
              ) : (
                <p className="text-sm font-medium text-ember-700" data-testid="structure-name">
                  not named: {naming?.reason}
                </p>
              )}
              <StructureFacts description={description.data} />
              {explanation && <NameExplanation explanation={explanation} />}
            </>
          )}
        </div>
      </div>
    </figure>
  );
}
