import type { CaughtMailSummary } from '../../../../shared/schemas';
import { formatDateTime } from '../../../lib/format';

const urlPattern = /(https?:\/\/[^\s<>"]+)/g;

/** Plain-text body with its links made clickable; the mail's HTML part is never injected. */
function LinkedText({ text }: { text: string }) {
  const parts = text.split(urlPattern);
  return (
    <>
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a key={index} href={part} className="break-all text-tide-600 underline hover:text-tide-800">
            {part}
          </a>
        ) : (
          <span key={index}>{part}</span>
        ),
      )}
    </>
  );
}

export function MailReader({ message }: { message: CaughtMailSummary }) {
  return (
    <article aria-label="Message" className="flex h-full flex-col">
      <header className="border-b border-fold px-6 py-4">
        <h2 className="text-lg font-semibold text-ink">{message.subject || '(no subject)'}</h2>
        <dl className="mt-2 grid grid-cols-[4rem_1fr] gap-y-0.5 text-sm">
          <dt className="text-ink-faint">From</dt>
          <dd className="text-ink-soft">{message.from}</dd>
          <dt className="text-ink-faint">To</dt>
          <dd className="text-ink-soft">{message.to.join(', ')}</dd>
          <dt className="text-ink-faint">Caught</dt>
          <dd className="text-ink-soft">{formatDateTime(message.receivedAt)}</dd>
        </dl>
      </header>
      <div className="whitespace-pre-wrap px-6 py-5 text-sm leading-relaxed text-ink" data-testid="mail-body">
        <LinkedText text={message.text} />
      </div>
    </article>
  );
}
