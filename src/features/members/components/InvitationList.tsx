import type { InvitationSummary } from '../../../../shared/schemas';
import { Badge } from '../../../components/Badge';
import { formatDateTime } from '../../../lib/format';
import { roleLabels } from '../../../lib/roles';

function state(invitation: InvitationSummary, now: number) {
  if (invitation.acceptedAt) return <Badge tone="tide">Accepted</Badge>;
  if (Date.parse(invitation.expiresAt) < now) return <Badge tone="ember">Expired</Badge>;
  return <Badge tone="reed">Waiting</Badge>;
}

export function InvitationList({ invitations }: { invitations: InvitationSummary[] }) {
  const now = Date.now();
  if (invitations.length === 0) return <p className="text-sm text-ink-soft">No invitations sent yet.</p>;
  return (
    <ul className="divide-y divide-fold" aria-label="Invitations">
      {invitations.map((invitation) => (
        <li key={invitation.id} className="flex items-start justify-between gap-3 py-2.5">
          <div className="min-w-0">
            <div className="truncate text-sm font-medium text-ink">{invitation.name}</div>
            <div className="truncate text-xs text-ink-soft">
              {invitation.email} · {roleLabels[invitation.role]}
            </div>
            <div className="text-xs text-ink-faint">Sent {formatDateTime(invitation.createdAt)}</div>
          </div>
          {state(invitation, now)}
        </li>
      ))}
    </ul>
  );
}
