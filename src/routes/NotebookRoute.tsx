import { Link, useNavigate, useParams } from 'react-router-dom';
import { ButtonLink } from '../components/Button';
import { EmptyState } from '../components/EmptyState';
import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageHeader } from '../components/PageHeader';
import { Panel } from '../components/Panel';
import { useNotebook } from '../features/notebooks/api/queries';
import { useNotebookPages } from '../features/pages/api/queries';
import { PageCreateForm } from '../features/pages/components/PageCreateForm';
import { PagesTable } from '../features/pages/components/PagesTable';
import { useSignedInPerson } from './AppLayout';

export function NotebookRoute() {
  const { notebookId = '' } = useParams();
  const me = useSignedInPerson();
  const notebook = useNotebook(notebookId);
  const pages = useNotebookPages(notebookId);
  const navigate = useNavigate();

  if (notebook.isPending) return <LoadingState label="Opening the notebook…" />;
  if (notebook.isError) return <ErrorState error={notebook.error} />;

  const { title, description, myRole } = notebook.data;
  const writes = me.role !== 'viewer' && (me.role === 'admin' || myRole === 'owner' || myRole === 'editor');

  return (
    <>
      <PageHeader
        overline={
          <Link to="/notebooks" className="hover:underline">
            Notebooks
          </Link>
        }
        title={title}
        description={description || undefined}
        actions={<ButtonLink to={`/notebooks/${notebookId}/members`}>Members</ButtonLink>}
      />
      {writes && (
        <Panel className="mb-6">
          <PageCreateForm notebookId={notebookId} onCreated={(page) => navigate(`/pages/${page.id}`)} />
        </Panel>
      )}
      {pages.isPending ? (
        <LoadingState label="Loading pages…" />
      ) : pages.isError ? (
        <ErrorState error={pages.error} />
      ) : pages.data.length === 0 ? (
        <EmptyState title="No pages yet">{writes ? 'Start the first page of this notebook above.' : 'Pages appear here once members write them.'}</EmptyState>
      ) : (
        <PagesTable pages={pages.data} />
      )}
    </>
  );
}
