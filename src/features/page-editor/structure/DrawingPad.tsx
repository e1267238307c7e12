import { useEffect, useRef, useState } from 'react';
import { loadOcl } from './chemistry';

/**
 * openchemlib's drawing editor, loaded only when someone opens it. Reports the drawing as a
 * molfile after every change (an empty drawing reports '').
 */
export function DrawingPad({ initialMolfile, onChange }: { initialMolfile: string; onChange: (molfile: string) => void }) {
  const host = useRef<HTMLDivElement>(null);
  const report = useRef(onChange);
  report.current = onChange;
  const [state, setState] = useState<'loading' | 'ready' | 'failed'>('loading');

  useEffect(() => {
    let destroy: (() => void) | null = null;
    let cancelled = false;
    loadOcl().then(
      ({ CanvasEditor, Molecule }) => {
        if (cancelled || !host.current) return;
        const editor = new CanvasEditor(host.current, { initialMode: 'molecule' });
        if (initialMolfile) editor.setMolecule(Molecule.fromMolfile(initialMolfile));
        editor.setOnChangeListener(() => {
          const molecule = editor.getMolecule();
          report.current(molecule.getAllAtoms() === 0 ? '' : molecule.toMolfile());
        });
        destroy = () => editor.destroy();
        setState('ready');
      },
      () => !cancelled && setState('failed'),
    );
    return () => {
      cancelled = true;
      destroy?.();
    };
  }, [initialMolfile]);

  return (
    <div className="relative h-[380px] w-full overflow-hidden rounded-md border border-fold-strong bg-white">
      <div ref={host} className="absolute inset-0" data-testid="drawing-pad" />
      {state === 'loading' && <p className="absolute inset-0 grid place-items-center text-sm text-ink-soft">Loading the drawing tools…</p>}
      {state === 'failed' && <p className="absolute inset-0 grid place-items-center text-sm text-ember-700">The drawing tools could not be loaded.</p>}
    </div>
  );
}
