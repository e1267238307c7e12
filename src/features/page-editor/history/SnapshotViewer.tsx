import { CollaborationPlugin } from '@lexical/react/LexicalCollaborationPlugin';
import { LexicalCollaboration } from '@lexical/react/LexicalCollaborationContext';
import { LexicalComposer } from '@lexical/react/LexicalComposer';
import { ContentEditable } from '@lexical/react/LexicalContentEditable';
import { LexicalErrorBoundary } from '@lexical/react/LexicalErrorBoundary';
import { ListPlugin } from '@lexical/react/LexicalListPlugin';
import { RichTextPlugin } from '@lexical/react/LexicalRichTextPlugin';
import { TablePlugin } from '@lexical/react/LexicalTablePlugin';
import type { Provider } from '@lexical/yjs';
import { useCallback, useId } from 'react';
import * as Y from 'yjs';
import { ModalOverlay } from '../../../components/ModalOverlay';
import { formatDateTime } from '../../../lib/format';
import { useSnapshot, type SnapshotState } from '../api/queries';
import { EditorEnvironmentContext, type EditorEnvironment } from '../EditorEnvironment';
import { editorNodes } from '../nodes/editorNodes';
import { editorTheme } from '../theme';
import { decodeBase64, SnapshotProvider } from './SnapshotProvider';

function SnapshotBody({ snapshot, environment }: { snapshot: SnapshotState; environment: EditorEnvironment }) {
  const providerFactory = useCallback(
    (id: string, docs: Map<string, Y.Doc>): Provider => {
      const doc = new Y.Doc();
      docs.set(id, doc);
      return new SnapshotProvider(doc, decodeBase64(snapshot.update)) as unknown as Provider;
    },
    [snapshot.update],
  );
  return (
    <EditorEnvironmentContext.Provider value={environment}>
      <LexicalCollaboration>
        <LexicalComposer
          initialConfig={{ namespace: `snapshot-${snapshot.id}`, theme: editorTheme, nodes: editorNodes, editable: false, editorState: null, onError: (error) => console.error(error) }}
        >
          <RichTextPlugin
            contentEditable={<ContentEditable aria-label="Page text at that time" className="min-h-40 outline-none" data-testid="snapshot-text" />}
            ErrorBoundary={LexicalErrorBoundary}
          />
          <ListPlugin />
          <TablePlugin />
          <CollaborationPlugin id={`snapshot-${snapshot.id}`} providerFactory={providerFactory} shouldBootstrap={false} />
        </LexicalComposer>
      </LexicalCollaboration>
    </EditorEnvironmentContext.Provider>
  );
}

/** One history snapshot, read only, over the page. */
export function SnapshotViewer({ pageId, snapshotId, environment, onClose }: { pageId: string; snapshotId: string; environment: EditorEnvironment; onClose: () => void }) {
  const titleId = useId();
  const snapshot = useSnapshot(pageId, snapshotId);

  return (
    <ModalOverlay labelledBy={titleId} onClose={onClose} className="flex max-h-[90vh] w-full max-w-4xl flex-col rounded-lg border border-fold bg-paper-card shadow-sheet">
      <header className="flex items-start justify-between gap-3 border-b border-fold px-5 py-3.5">
        <div>
          <h2 id={titleId} className="text-base font-semibold text-ink">
            Earlier version{snapshot.data && ` · ${formatDateTime(snapshot.data.takenAt)}`}
          </h2>
          <p className="mt-0.5 text-sm text-ink-soft">Read only. The page itself is not changed by looking back.</p>
        </div>
        <button type="button" onClick={onClose} className="rounded px-2 py-1 text-sm text-tide-700 hover:bg-tide-50">
          Close
        </button>
      </header>
      <div className="ruled overflow-auto px-6 py-4">
        {snapshot.isPending && <p className="text-sm text-ink-soft">Opening the version…</p>}
        {snapshot.isError && <p className="text-sm text-ember-700">{snapshot.error.message}</p>}
        {snapshot.data && <SnapshotBody snapshot={snapshot.data} environment={environment} />}
      </div>
    </ModalOverlay>
  );
}
