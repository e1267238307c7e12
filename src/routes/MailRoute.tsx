import { useParams } from 'react-router-dom';
import { EmptyState } from '../components/EmptyState';
import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageHeader } from '../components/PageHeader';
import { useCaughtMail } from '../features/mail/api/queries';
import { MailList } from '../features/mail/components/MailList';
import { MailReader } from '../features/mail/components/MailReader';
import { AdminOnly } from './AdminOnly';

function MailRoom() {
  const { mailId } = useParams();
  const mail = useCaughtMail();

  const header = (
    <PageHeader
      overline="Organisation"
      title="Mail room"
      description="Everything Quillane sent (invitations, password resets) is caught here instead of leaving the machine."
    />
  );
  if (mail.isPending) return <>{header}<LoadingState label="Loading mail…" /></>;
  if (mail.isError) return <>{header}<ErrorState error={mail.error} /></>;
  if (mail.data.length === 0) return <>{header}<EmptyState title="No mail caught yet">Invite someone and the invitation shows up here.</EmptyState></>;

  const open = mail.data.find((message) => message.id === mailId);
  return (
    <>
      {header}
      <div className="grid min-h-[32rem] overflow-hidden rounded-lg border border-fold bg-paper-card shadow-sheet md:grid-cols-[20rem_1fr]">
        <div className="max-h-[70vh] overflow-y-auto border-b border-fold md:border-b-0 md:border-r">
          <MailList mail={mail.data} openId={open?.id} />
        </div>
        <div className="min-w-0">
          {open ? (
            <MailReader message={open} />
          ) : (
            <div className="flex h-full items-center justify-center p-10 text-sm text-ink-soft">
              {mailId ? 'That message is no longer in the mail room.' : 'Choose a message to read it.'}
            </div>
          )}
        </div>
      </div>
    </>
  );
}

export function MailRoute() {
  return (
    <AdminOnly>
      <MailRoom />
    </AdminOnly>
  );
}
