import type { VerifyReport } from '../../../../shared/schemas/signing';

/** "Record intact", or what no longer matches. */
export function VerificationState({ report }: { report: VerifyReport }) {
  const active = report.signatures.filter((s) => !s.withdrawn);
  if (active.length === 0 && report.auditChain.intact) return null;
  if (report.intact) {
    return (
      <p role="status" data-testid="record-state" className="rounded-md border border-tide-200 bg-tide-50 px-3 py-2 text-sm font-medium text-tide-700">
        Record intact: every signature matches the stored content, and the audit trail holds.
      </p>
    );
  }
  return (
    <div role="alert" data-testid="record-state" className="rounded-md border border-ember-100 bg-ember-50 px-3 py-2 text-sm text-ember-700">
      <p className="font-medium">Record changed since signing.</p>
      <ul className="mt-1 list-disc pl-5">
        {report.signatures
          .filter((s) => !s.intact)
          .flatMap((s) => s.changes.map((c) => `${s.signerName}: ${c}`))
          .map((line) => (
            <li key={line}>{line}</li>
          ))}
        {!report.auditChain.intact && <li>Audit trail: {report.auditChain.problem}</li>}
      </ul>
    </div>
  );
}
