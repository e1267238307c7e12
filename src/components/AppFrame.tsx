import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import { initials } from '../lib/format';
import { Wordmark } from './Wordmark';

export interface NavItem {
  to: string;
  label: string;
  icon: ReactNode;
}

/** The signed-in frame: a left rail with the mark, navigation and the person, and the work area. */
export function AppFrame({ nav, person, signOut, children }: {
  nav: NavItem[];
  person: { name: string; email: string; roleLabel: string };
  signOut: ReactNode;
  children: ReactNode;
}) {
  return (
    <div className="flex min-h-screen">
      <aside className="sticky top-0 flex h-screen w-60 shrink-0 flex-col bg-tide-800 text-tide-100">
        <div className="px-5 pb-6 pt-5">
          <Wordmark inverted />
        </div>
        <nav aria-label="Main" className="flex-1 space-y-0.5 px-3">
          {nav.map((item) => (
            <NavLink
              key={item.to}
              to={item.to}
              className={({ isActive }) =>
                `flex items-center gap-3 rounded-md px-3 py-2 text-sm font-medium transition-colors ${
                  isActive ? 'bg-tide-600 text-paper-card' : 'text-tide-200 hover:bg-tide-700 hover:text-paper-card'
                }`
              }
            >
              <span className="size-4 shrink-0" aria-hidden>
                {item.icon}
              </span>
              {item.label}
            </NavLink>
          ))}
        </nav>
        <div className="border-t border-tide-700 px-4 py-4">
          <div className="flex items-center gap-3">
            <span className="flex size-9 items-center justify-center rounded-full bg-reed-300 text-sm font-semibold text-tide-900" aria-hidden>
              {initials(person.name)}
            </span>
            <div className="min-w-0">
              <div className="truncate text-sm font-medium text-paper-card" data-testid="signed-in-name">
                {person.name}
              </div>
              <div className="truncate text-xs text-tide-300">{person.roleLabel}</div>
            </div>
          </div>
          <div className="mt-3">{signOut}</div>
        </div>
      </aside>
      <main className="min-w-0 flex-1 px-8 py-8 lg:px-12">
        <div className="mx-auto max-w-6xl">{children}</div>
      </main>
    </div>
  );
}
