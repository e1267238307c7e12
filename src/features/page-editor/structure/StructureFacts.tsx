import type { Description } from '../../../../shared/chem';

/** "C6H12O2" with its counts set as subscripts. */
export function Formula({ formula }: { formula: string }) {
  const parts = formula.split(/(\d+)/).filter(Boolean);
  return (
    <span data-formula={formula}>
      {parts.map((part, i) => (/^\d+$/.test(part) ? <sub key={i}>{part}</sub> : <span key={i}>{part}</span>))}
    </span>
  );
}

// Common practice, no source: average molar mass to two decimals, monoisotopic mass to four.
export const formatAverageMass = (mass: number) => `${mass.toFixed(2)} g/mol`;
export const formatMonoisotopicMass = (mass: number) => `${mass.toFixed(4)} Da`;

export function StructureFacts({ description }: { description: Description }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      <dt className="text-ink-faint">Formula</dt>
      <dd className="font-mono text-ink" data-testid="structure-formula">
        <Formula formula={description.formula} />
      </dd>
      <dt className="text-ink-faint">Average mass</dt>
      <dd className="font-mono text-ink" data-testid="structure-average-mass">
        {formatAverageMass(description.averageMass)}
      </dd>
      <dt className="text-ink-faint">Monoisotopic mass</dt>
      <dd className="font-mono text-ink" data-testid="structure-monoisotopic-mass">
        {formatMonoisotopicMass(description.monoisotopicMass)}
      </dd>
    </dl>
  );
}
