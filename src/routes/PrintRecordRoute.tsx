import { Link, useParams } from 'react-router-dom';
import { Button } from '../components/Button';
import { PrintRecordView } from '../features/signing/components/PrintRecordView';

/** A page's printable record; the browser's print command gives the paper copy. */
export function PrintRecordRoute() {
  const { pageId = '' } = useParams();
  return (
    <>
      <div className="mb-4 flex flex-wrap items-center gap-3 print:hidden">
        <Link to={`/pages/${pageId}`} className="text-sm font-medium text-tide-600 hover:underline">
          Back to the page
        </Link>
        <Button tone="secondary" onClick={() => window.print()}>
          Print
        </Button>
        <a href={`/api/pages/${encodeURIComponent(pageId)}/record.pdf`} className="text-sm font-medium text-tide-600 hover:underline">
          Download PDF
        </a>
      </div>
      <PrintRecordView pageId={pageId} />
    </>
  );
}
