import { Link } from 'react-router-dom';
import type { CaughtMailSummary } from '../../../../shared/schemas';
import { formatDateTime } from '../../../lib/format';

export function MailList({ mail, openId }: { mail: CaughtMailSummary[]; openId: string | undefined }) {
  return (
    <ul className="divide-y divide-fold" aria-label="Caught mail">
      {mail.map((message) => {
        const open = message.id === openId;
        return (
          <li key={message.id}>
            <Link
              to={`/mail/${message.id}`}
              aria-current={open ? 'true' : undefined}
              className={`block border-l-3 px-4 py-3 transition-colors ${open ? 'border-reed-500 bg-tide-50' : 'border-transparent hover:bg-paper-deep/60'}`}
            >
              <div className="flex items-baseline justify-between gap-2">
                <span className="truncate text-sm font-medium text-ink">{message.subject || '(no subject)'}</span>
              </div>
              <div className="mt-0.5 truncate text-xs text-ink-soft">To {message.to.join(', ')}</div>
              <div className="text-xs text-ink-faint">{formatDateTime(message.receivedAt)}</div>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
