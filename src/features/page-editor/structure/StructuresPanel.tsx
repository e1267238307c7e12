import type { StructureFields } from '../../../../shared/editor';
import { useStructureDescription } from '../api/queries';
import { Formula, formatAverageMass } from './StructureFacts';

function StructureEntry({ structure, position }: { structure: StructureFields; position: number }) {
  const description = useStructureDescription(structure.molfile, 'preferred');
  const naming = description.data?.naming;
  const go = () => {
    const block = document.getElementById(`structure-${structure.structureKey}`);
    block?.scrollIntoView({ behavior: 'smooth', block: 'center' });
    block?.focus({ preventScroll: true });
  };
  return (
    <li>
      <a
        href={`#structure-${structure.structureKey}`}
        onClick={(event) => {
          event.preventDefault();
          go();
        }}
        className="block rounded-md px-2.5 py-2 hover:bg-tide-50"
        data-testid="structure-entry"
      >
        <span className="block text-xs font-semibold text-ink-faint">{structure.label || `Structure ${position}`}</span>
        <span className="block text-sm break-words text-ink">
          {naming ? (naming.ok ? naming.name : <span className="text-ember-700">not named</span>) : description.isError ? 'unreadable' : '…'}
        </span>
        {description.data && (
          <span className="mt-0.5 block font-mono text-xs text-ink-soft">
            <Formula formula={description.data.formula} /> · {formatAverageMass(description.data.averageMass)}
          </span>
        )}
      </a>
    </li>
  );
}

/** The page's structures in order, each leading to its block. */
export function StructuresPanel({ structures }: { structures: StructureFields[] }) {
  return (
    <section aria-labelledby="page-structures-title" className="rounded-lg border border-fold bg-paper-card/90 p-3">
      <h2 id="page-structures-title" className="px-2.5 text-xs font-semibold uppercase tracking-[0.14em] text-tide-600">
        Structures on this page
      </h2>
      {structures.length === 0 ? (
        <p className="px-2.5 pt-2 text-sm text-ink-faint">None yet. Add one from the block menu.</p>
      ) : (
        <ol className="mt-1 space-y-0.5">
          {structures.map((structure, i) => (
            <StructureEntry key={structure.structureKey} structure={structure} position={i + 1} />
          ))}
        </ol>
      )}
    </section>
  );
}
