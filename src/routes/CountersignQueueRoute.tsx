import { PageHeader } from '../components/PageHeader';
import { CountersignQueue } from '../features/signing/components/CountersignQueue';

/** The supervisor's countersigning queue. */
export function CountersignQueueRoute() {
  return (
    <>
      <PageHeader title="Waiting for your countersignature" description="Oldest first. Open a page to countersign it or return it with a comment." />
      <CountersignQueue />
    </>
  );
}
