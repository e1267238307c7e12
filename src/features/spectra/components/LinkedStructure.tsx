import { useEffect, useId, useState } from 'react';

export interface StructureForSpectrum {
  label: string;
  molfile: string;
  smiles: string;
}

/** The structure a spectrum belongs to, drawn beside it (openchemlib loads only when needed). */
export function LinkedStructure({ structure }: { structure: StructureForSpectrum }) {
  const [svg, setSvg] = useState<string | null>(null);
  const [failed, setFailed] = useState(false);
  const id = useId().replace(/:/g, '');

  useEffect(() => {
    let current = true;
    import('openchemlib')
      .then(({ Molecule }) => {
        const molecule = structure.molfile ? Molecule.fromMolfile(structure.molfile) : Molecule.fromSmiles(structure.smiles);
        if (current) setSvg(molecule.toSVG(220, 180, `spectrum-structure-${id}`, { suppressChiralText: true }));
      })
      .catch(() => current && setFailed(true));
    return () => {
      current = false;
    };
  }, [structure.molfile, structure.smiles, id]);

  return (
    <figure className="flex w-56 shrink-0 flex-col items-center gap-1 rounded border border-fold bg-paper p-2" data-testid="linked-structure">
      {svg ? (
        <div className="h-44 w-full" dangerouslySetInnerHTML={{ __html: svg }} />
      ) : (
        <div className="flex h-44 w-full items-center justify-center text-xs text-ink-faint">{failed ? 'The structure could not be drawn' : 'Drawing…'}</div>
      )}
      <figcaption className="text-center text-xs text-ink-soft">
        Spectrum of <span className="font-semibold text-ink">{structure.label || 'this structure'}</span>
        {structure.smiles && <span className="block break-all font-mono text-[0.65rem] text-ink-faint">{structure.smiles}</span>}
      </figcaption>
    </figure>
  );
}
