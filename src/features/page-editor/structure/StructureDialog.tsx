import { useId, useRef, useState, type DragEvent } from 'react';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { ModalOverlay } from '../../../components/ModalOverlay';
import type { StructureDialogRequest } from '../EditorEnvironment';
import { DrawingPad } from './DrawingPad';
import { prepareStructure } from './prepareStructure';
import type { StructureContent } from './structureEdits';
import { classifyStructureText, STRUCTURE_FILE_TYPES, structureFromFile, StructureTextProblem } from './structureText';

type Way = 'text' | 'draw';

const tabClass = (active: boolean) =>
  `rounded-t-md border-b-2 px-3 py-1.5 text-sm font-medium ${active ? 'border-tide-600 text-tide-700' : 'border-transparent text-ink-soft hover:text-tide-700'}`;

/**
 * Adding a structure (typed, pasted, dropped as a file, or drawn) or redrawing one. Input is
 * checked by the naming engine before anything reaches the page; problems are shown here.
 */
export function StructureDialog({
  request,
  onClose,
  onDone,
}: {
  request: StructureDialogRequest;
  onClose: () => void;
  onDone: (result: StructureContent) => void;
}) {
  const titleId = useId();
  const textId = useId();
  const labelId = useId();
  const redraw = request.mode === 'redraw' ? request.fields : null;
  const [way, setWay] = useState<Way>(request.mode === 'redraw' ? 'draw' : request.start);
  const [text, setText] = useState('');
  const [fileNote, setFileNote] = useState<string | null>(null);
  const [drawn, setDrawn] = useState(redraw?.molfile ?? '');
  const [label, setLabel] = useState(redraw?.label ?? '');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const fileInput = useRef<HTMLInputElement>(null);

  async function readFile(file: File) {
    setProblem(null);
    try {
      const content = await file.text();
      const found = structureFromFile(file.name, content);
      setText('molfile' in found ? found.molfile : found.smiles);
      setFileNote(`Read from ${file.name}`);
      setWay('text');
    } catch (error) {
      setProblem(error instanceof StructureTextProblem ? error.message : `"${file.name}" could not be read.`);
    }
  }

  function onDrop(event: DragEvent) {
    const file = event.dataTransfer.files[0];
    if (!file) return;
    event.preventDefault();
    void readFile(file);
  }

  async function submit() {
    setProblem(null);
    setBusy(true);
    try {
      if (way === 'draw' && drawn === '') throw new StructureTextProblem('The drawing is empty: draw at least one atom.');
      const input = way === 'draw' ? { molfile: drawn } : classifyStructureText(text);
      const prepared = await prepareStructure(input);
      onDone({ ...prepared, label: label.trim() });
    } catch (error) {
      setProblem(error instanceof StructureTextProblem ? error.message : 'The structure could not be checked. Try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <ModalOverlay
      labelledBy={titleId}
      onClose={onClose}
      className="w-full max-w-2xl rounded-lg border border-fold bg-paper-card shadow-sheet"
      onDragOver={(event) => event.preventDefault()}
      onDrop={onDrop}
    >
      <form
        onSubmit={(event) => {
          event.preventDefault();
          void submit();
        }}
      >
        <header className="border-b border-fold px-5 py-3.5">
          <h2 id={titleId} className="text-base font-semibold text-ink">
            {redraw ? 'Redraw the structure' : 'Add a structure'}
          </h2>
          <p className="mt-0.5 text-sm text-ink-soft">The name, formula and masses are worked out as soon as it is on the page.</p>
        </header>
        <div className="space-y-4 px-5 py-4">
          <div role="tablist" aria-label="How to give the structure" className="flex gap-2 border-b border-fold">
            <button type="button" role="tab" aria-selected={way === 'text'} className={tabClass(way === 'text')} onClick={() => setWay('text')}>
              Paste or type
            </button>
            <button type="button" role="tab" aria-selected={way === 'draw'} className={tabClass(way === 'draw')} onClick={() => setWay('draw')}>
              Draw
            </button>
          </div>
          {way === 'text' ? (
            <div className="space-y-1.5">
              <label htmlFor={textId} className="block text-sm font-medium text-ink">
                SMILES or molfile
              </label>
              <textarea
                id={textId}
                value={text}
                onChange={(event) => {
                  setText(event.target.value);
                  setFileNote(null);
                }}
                rows={6}
                spellCheck={false}
                autoFocus
                placeholder="CC(C)CCOC(C)=O"
                className="block w-full rounded-md border border-fold-strong bg-paper-card px-3 py-2 font-mono text-sm text-ink focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200"
              />
              <div className="flex flex-wrap items-center justify-between gap-2 text-xs text-ink-faint">
                <span>{fileNote ?? 'One SMILES on one line, or a whole molfile. A .mol file dropped on this box is read in.'}</span>
                <button type="button" className="font-medium text-tide-700 hover:underline" onClick={() => fileInput.current?.click()}>
                  Choose a file…
                </button>
                <input
                  ref={fileInput}
                  type="file"
                  accept={STRUCTURE_FILE_TYPES.join(',')}
                  className="hidden"
                  aria-label="Structure file"
                  onChange={(event) => {
                    const file = event.target.files?.[0];
                    if (file) void readFile(file);
                    event.target.value = '';
                  }}
                />
              </div>
            </div>
          ) : (
            <DrawingPad initialMolfile={redraw?.molfile ?? ''} onChange={setDrawn} />
          )}
          <div className="space-y-1.5">
            <label htmlFor={labelId} className="block text-sm font-medium text-ink">
              Label <span className="font-normal text-ink-faint">(optional)</span>
            </label>
            <input
              id={labelId}
              value={label}
              onChange={(event) => setLabel(event.target.value)}
              maxLength={80}
              placeholder="e.g. compound 3"
              className="block w-full rounded-md border border-fold-strong bg-paper-card px-3 py-2 text-sm text-ink focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200"
            />
          </div>
          <FormAlert message={problem} />
        </div>
        <footer className="flex justify-end gap-2 border-t border-fold px-5 py-3">
          <Button tone="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={busy}>
            {redraw ? 'Save the structure' : 'Add to page'}
          </Button>
        </footer>
      </form>
    </ModalOverlay>
  );
}
