import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../components/Button';
import { EmptyState } from '../components/EmptyState';
import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageHeader } from '../components/PageHeader';
import { Panel } from '../components/Panel';
import { useNotebooks } from '../features/notebooks/api/queries';
import { NotebookCreateForm } from '../features/notebooks/components/NotebookCreateForm';
import { NotebookGrid } from '../features/notebooks/components/NotebookGrid';
import { useSignedInPerson } from './AppLayout';

export function NotebooksRoute() {
  const me = useSignedInPerson();
  const notebooks = useNotebooks();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const mayCreate = me.role !== 'viewer';

  return (
    <>
      <PageHeader
        overline="Shelf"
        title="Notebooks"
        description={me.role === 'admin' ? 'Every notebook of the group.' : 'The notebooks you are a member of.'}
        actions={mayCreate && !creating && <Button onClick={() => setCreating(true)}>New notebook</Button>}
      />
      {creating && (
        <Panel title="New notebook" description="You become its owner and can add members afterwards." className="mb-6 max-w-xl">
          <NotebookCreateForm onCreated={(notebook) => navigate(`/notebooks/${notebook.id}`)} onCancel={() => setCreating(false)} />
        </Panel>
      )}
      {notebooks.isPending ? (
        <LoadingState label="Loading notebooks…" />
      ) : notebooks.isError ? (
        <ErrorState error={notebooks.error} />
      ) : notebooks.data.length === 0 ? (
        <EmptyState title="No notebooks yet">
          {mayCreate ? 'Start one for your next series of experiments.' : 'When someone adds you to a notebook it appears here.'}
        </EmptyState>
      ) : (
        <NotebookGrid notebooks={notebooks.data} />
      )}
    </>
  );
}
