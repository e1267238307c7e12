/** GHS hazard statement codes (H200–H499, EUH…) as they appear in the chemist's notes. */
const hazardCode = /\b((?:EUH|H)[2-4]\d{2}[A-Za-z]{0,2})\b/;

/** The chemist's hazard notes as typed, with any hazard statement codes set apart; nothing is looked up or added. */
export function HazardNotes({ text }: { text: string }) {
  if (!text) return <span className="text-ink-faint">none entered</span>;
  const parts = text.split(hazardCode);
  return (
    <span className="whitespace-pre-wrap">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <span key={i} className="rounded bg-ember-50 px-1 font-mono text-[0.85em] text-ember-700 ring-1 ring-inset ring-ember-100" data-testid="hazard-code">
            {part}
          </span>
        ) : (
          part
        ),
      )}
    </span>
  );
}
