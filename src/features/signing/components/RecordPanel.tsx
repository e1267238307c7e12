import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { PageRecord } from '../../../../shared/schemas/signing';
import { Button } from '../../../components/Button';
import { ErrorState } from '../../../components/ErrorState';
import { LoadingState } from '../../../components/LoadingState';
import { Panel } from '../../../components/Panel';
import { formatDateTime } from '../../../lib/format';
import { usePageRecord, useVerification } from '../api/queries';
import { AddendumDialog } from './AddendumDialog';
import { AuditTrailView } from './AuditTrailView';
import { ReviewDialog } from './ReviewDialog';
import { SignatureList } from './SignatureList';
import { SignDialog } from './SignDialog';
import { VerificationState } from './VerificationState';

type Open = { kind: 'sign' } | { kind: 'addendum' } | { kind: 'review'; addendumId: string | null; label: string } | null;

function waitingFor(record: PageRecord, me: { id: string }, addendumId: string | null) {
  return record.requests.find((r) => r.state === 'waiting' && r.addendumId === addendumId && r.supervisor.id === me.id);
}

/**
 * The record under a page: its signatures and their check, the countersign state, returns,
 * addenda, and the audit trail; the actions the signed-in person may take right now.
 */
export function RecordPanel({ pageId, me, onChanged }: { pageId: string; me: { id: string }; onChanged?: () => void }) {
  const record = usePageRecord(pageId);
  const verification = useVerification(pageId);
  const [open, setOpen] = useState<Open>(null);
  const [showTrail, setShowTrail] = useState(false);

  if (record.isPending) return <LoadingState label="Reading the signatures…" />;
  if (record.isError) return <ErrorState error={record.error} />;
  const r = record.data;
  const pageSignatures = r.signatures.filter((s) => s.addendumId === null);
  const pending = r.requests.find((q) => q.state === 'waiting' && q.addendumId === null);
  const lastReturn = r.status === 'draft' ? r.returns.filter((x) => x.addendumId === null).at(-1) : undefined;
  const close = () => setOpen(null);

  return (
    <Panel
      title="Signatures and record"
      className="mt-6"
      actions={
        <div className="flex flex-wrap gap-2">
          {r.can.sign && <Button onClick={() => setOpen({ kind: 'sign' })}>Sign page</Button>}
          {r.can.countersign && waitingFor(r, me, null) && (
            <Button onClick={() => setOpen({ kind: 'review', addendumId: null, label: 'this page' })}>Countersign or return</Button>
          )}
          {r.can.addAddendum && (
            <Button tone="secondary" onClick={() => setOpen({ kind: 'addendum' })}>
              Add addendum
            </Button>
          )}
        </div>
      }
    >
      <div className="space-y-4">
        {verification.data && <VerificationState report={verification.data} />}
        {lastReturn && (
          <div className="rounded-md border border-heron-100 bg-heron-50 px-3 py-2 text-sm text-heron-700">
            Returned by {lastReturn.returnedBy.name} on {formatDateTime(lastReturn.returnedAt)}: “{lastReturn.comment}”
          </div>
        )}
        {pending && (
          <p className="text-sm text-ink-soft" data-testid="countersign-pending">
            Waiting for {pending.supervisor.name}’s countersignature since {formatDateTime(pending.requestedAt)}.
          </p>
        )}
        <SignatureList signatures={pageSignatures} checks={verification.data?.signatures} />

        {r.addenda.map((a) => {
          const waiting = waitingFor(r, me, a.id);
          return (
            <section key={a.id} className="border-t border-fold pt-4" aria-label={`Addendum ${a.number}`}>
              <h3 className="text-sm font-semibold">
                Addendum {a.number} · {formatDateTime(a.createdAt)} · {a.author.name}
              </h3>
              <p className="mt-1 whitespace-pre-wrap text-sm">{a.text}</p>
              <div className="mt-2">
                <SignatureList signatures={r.signatures.filter((s) => s.addendumId === a.id)} checks={verification.data?.signatures} />
              </div>
              {waiting && (
                <Button className="mt-2" tone="secondary" onClick={() => setOpen({ kind: 'review', addendumId: a.id, label: `addendum ${a.number}` })}>
                  Countersign or return addendum {a.number}
                </Button>
              )}
            </section>
          );
        })}

        <div className="flex flex-wrap gap-4 border-t border-fold pt-3 text-sm">
          <button type="button" className="font-medium text-tide-600 hover:underline" aria-expanded={showTrail} onClick={() => setShowTrail((v) => !v)}>
            {showTrail ? 'Hide audit trail' : 'Show audit trail'}
          </button>
          <Link to={`/pages/${pageId}/print`} className="font-medium text-tide-600 hover:underline">
            Print view
          </Link>
          <a href={`/api/pages/${encodeURIComponent(pageId)}/record.pdf`} className="font-medium text-tide-600 hover:underline">
            Download PDF
          </a>
        </div>
        {showTrail && <AuditTrailView pageId={pageId} />}
      </div>

      {open?.kind === 'sign' && <SignDialog pageId={pageId} onClose={close} onChanged={onChanged} />}
      {open?.kind === 'addendum' && <AddendumDialog pageId={pageId} onClose={close} onChanged={onChanged} />}
      {open?.kind === 'review' && <ReviewDialog pageId={pageId} addendumId={open.addendumId} label={open.label} onClose={close} onChanged={onChanged} />}
    </Panel>
  );
}
