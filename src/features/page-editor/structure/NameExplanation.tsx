import type { Explanation } from '../../../../shared/chem';

const parentKinds: Record<Explanation['parent']['kind'], string> = {
  chain: 'Parent chain',
  ring: 'Parent ring',
  benzene: 'Parent ring (benzene)',
};

/** The engine's reasons for a name, in words: parent, its numbering, and what hangs off it. */
export function NameExplanation({ explanation }: { explanation: Explanation }) {
  const { parent, substituents, principalGroups = [] } = explanation;
  return (
    <div className="rounded-md border border-reed-300 bg-reed-100/50 px-3 py-2 text-sm" data-testid="name-explanation">
      <p>
        <span className="font-medium text-reed-700">{parentKinds[parent.kind]}:</span> {parent.name}, {parent.atoms.length}{' '}
        {parent.atoms.length === 1 ? 'atom' : 'atoms'} numbered 1 to {parent.atoms.length} on the drawing.
      </p>
      {principalGroups.length > 0 && (
        <p className="mt-1">
          <span className="font-medium text-reed-700">Named as suffix:</span>{' '}
          {principalGroups.map((group) => `${group.suffix} at ${group.locant}`).join('; ')}
        </p>
      )}
      <p className="mt-1 font-medium text-reed-700">Substituents</p>
      {substituents.length === 0 ? (
        <p className="text-ink-soft">None: the parent carries no prefixes.</p>
      ) : (
        <ul className="list-inside list-disc">
          {substituents.map((substituent, i) => (
            <li key={i}>
              <span className="font-mono">{substituent.locant}</span>-{substituent.name}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
