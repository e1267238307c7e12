import type { PageStatus } from '../../../../shared/schemas';
import { Badge, type BadgeTone } from '../../../components/Badge';

const looks: Record<PageStatus, { tone: BadgeTone; label: string }> = {
  draft: { tone: 'neutral', label: 'Draft' },
  signed: { tone: 'reed', label: 'Signed' },
  witnessed: { tone: 'tide', label: 'Witnessed' },
};

export function PageStatusBadge({ status, locked }: { status: PageStatus; locked?: boolean }) {
  const look = looks[status];
  return (
    <span className="inline-flex items-center gap-1.5">
      <Badge tone={look.tone}>{look.label}</Badge>
      {locked && status === 'draft' && <Badge tone="heron">Locked</Badge>}
    </span>
  );
}
