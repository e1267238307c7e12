import { ErrorState } from '../../../components/ErrorState';
import { LoadingState } from '../../../components/LoadingState';
import { formatDateTime, formatPageNumber } from '../../../lib/format';
import { usePrintRecord } from '../api/queries';
import { SignatureList } from './SignatureList';
import { VerificationState } from './VerificationState';

/** The page laid out for paper: content, addenda, signatures, hash and verification state. */
export function PrintRecordView({ pageId }: { pageId: string }) {
  const print = usePrintRecord(pageId);
  if (print.isPending) return <LoadingState label="Preparing the printable record…" />;
  if (print.isError) return <ErrorState error={print.error} />;
  const p = print.data;
  return (
    <article className="mx-auto max-w-3xl space-y-5 bg-paper-card p-8 print:p-0" aria-label="Printable record">
      <header className="border-b border-fold pb-3">
        <div className="text-sm text-ink-soft">{p.notebookTitle}</div>
        <h1 className="text-xl font-semibold">
          Page {formatPageNumber(p.pageNumber)}: {p.pageTitle}
        </h1>
        <div className="text-sm text-ink-soft">
          Author {p.author} · status {p.status} · printed {formatDateTime(p.printedAt)}
        </div>
      </header>
      <VerificationState report={p.verification} />
      <p className="break-all font-mono text-xs text-ink-faint">Content SHA-256 {p.verification.currentHash}</p>
      <section>
        <h2 className="mb-1 font-semibold">Content</h2>
        <p className="whitespace-pre-wrap text-sm">{p.text || '(no text)'}</p>
      </section>
      {p.structures.length > 0 && (
        <section>
          <h2 className="mb-1 font-semibold">Structures</h2>
          <ul className="text-sm">
            {p.structures.map((s) => (
              <li key={s.key}>
                {s.key}: <span className="font-mono">{s.smiles}</span>
              </li>
            ))}
          </ul>
        </section>
      )}
      {p.attachments.length > 0 && (
        <section>
          <h2 className="mb-1 font-semibold">Files</h2>
          <ul className="text-sm">
            {p.attachments.map((f) => (
              <li key={f.sha256 + f.name}>
                {f.name} ({f.size} bytes) <span className="break-all font-mono text-xs">SHA-256 {f.sha256}</span>
              </li>
            ))}
          </ul>
        </section>
      )}
      {p.addenda.map((a) => (
        <section key={a.id}>
          <h2 className="mb-1 font-semibold">
            Addendum {a.number} · {formatDateTime(a.createdAt)} · {a.author.name}
          </h2>
          <p className="whitespace-pre-wrap text-sm">{a.text}</p>
        </section>
      ))}
      <section>
        <h2 className="mb-2 font-semibold">Signatures</h2>
        <SignatureList signatures={p.signatures} checks={p.verification.signatures} />
      </section>
    </article>
  );
}
