import type { SignatureCheck, SignatureView } from '../../../../shared/schemas/signing';
import { Badge } from '../../../components/Badge';
import { formatDateTime } from '../../../lib/format';

/**
 * Signatures as 21 CFR 11.50 asks them to be shown: printed name, date and time (in the reader's
 * time zone; UTC on hover) and meaning, with the hash that links each to its content (11.70).
 */
export function SignatureList({ signatures, checks }: { signatures: SignatureView[]; checks?: SignatureCheck[] }) {
  if (signatures.length === 0) return <p className="text-sm text-ink-soft">Not signed yet.</p>;
  return (
    <ul className="space-y-3">
      {signatures.map((s) => {
        const check = checks?.find((c) => c.signatureId === s.id);
        return (
          <li key={s.id} className="rounded-md border border-fold px-4 py-3" data-testid="signature">
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-medium">
                {s.role === 'author' ? 'Signed by' : 'Countersigned by'} {s.signer.name}
              </span>
              <time dateTime={s.signedAt} title={`${s.signedAt} (UTC)`} className="text-sm text-ink-soft">
                {formatDateTime(s.signedAt)}
              </time>
              {s.withdrawn && <Badge tone="heron">Withdrawn: page returned</Badge>}
              {check && !check.intact && <Badge tone="ember">Does not match</Badge>}
            </div>
            <p className="mt-1 text-sm italic text-ink">“{s.meaning}”</p>
            <p className="mt-1 break-all font-mono text-xs text-ink-faint" title="SHA-256 of the signed content">
              {s.contentHash}
            </p>
            {check && !check.intact && (
              <ul className="mt-2 list-disc space-y-0.5 pl-5 text-sm text-ember-700">
                {check.changes.map((change) => (
                  <li key={change}>{change}</li>
                ))}
              </ul>
            )}
          </li>
        );
      })}
    </ul>
  );
}
