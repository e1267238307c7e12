import { useSmilesDescription } from '../api/queries';
import { Formula, formatAverageMass } from '../structure/StructureFacts';

/** Formula and molar mass of a reagent's SMILES from the naming engine, with its name when it gives one. */
export function ReagentFacts({ smiles }: { smiles: string }) {
  const description = useSmilesDescription(smiles);
  if (!smiles) return <span className="text-ink-faint">—</span>;
  if (description.isPending) return <span className="text-ink-soft">…</span>;
  if (description.isError) {
    return (
      <span className="text-ember-700" data-testid="reagent-smiles-problem">
        SMILES not read: {description.error.message}
      </span>
    );
  }
  const { naming, formula, averageMass } = description.data;
  return (
    <span className="block" data-testid="reagent-facts">
      <span className="block font-mono" data-testid="reagent-formula">
        <Formula formula={formula} /> · {formatAverageMass(averageMass)}
      </span>
      <span className="block text-xs text-ink-faint" data-testid="reagent-engine-name">
        {naming.ok ? naming.name : 'not named'}
      </span>
    </span>
  );
}
