import { initials } from '../../../lib/format';
import type { PresentPerson } from './useCollabStatus';

/** Who has the page open, each in the colour of their caret. */
export function PresenceList({ people }: { people: PresentPerson[] }) {
  if (people.length === 0) return null;
  return (
    <ul aria-label="On this page now" className="flex items-center -space-x-1.5" data-testid="presence">
      {people.map((person) => (
        <li key={person.userId} title={person.self ? `${person.name} (you)` : person.name}>
          <span
            className="grid size-7 place-items-center rounded-full text-[11px] font-semibold text-white ring-2 ring-paper-card"
            style={{ backgroundColor: person.colour }}
          >
            {initials(person.name)}
          </span>
          <span className="sr-only">{person.self ? `${person.name} (you)` : person.name}</span>
        </li>
      ))}
    </ul>
  );
}
