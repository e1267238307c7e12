import './editor.css';
import { CheckListPlugin } from '@lexical/react/LexicalCheckListPlugin';
import { ClickableLinkPlugin } from '@lexical/react/LexicalClickableLinkPlugin';
import { CollaborationPlugin } from '@lexical/react/LexicalCollaborationPlugin';
import { LexicalCollaboration } from '@lexical/react/LexicalCollaborationContext';
import { LexicalComposer } from '@lexical/react/LexicalComposer';
import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { ContentEditable } from '@lexical/react/LexicalContentEditable';
import { LexicalErrorBoundary } from '@lexical/react/LexicalErrorBoundary';
import { LinkPlugin } from '@lexical/react/LexicalLinkPlugin';
import { ListPlugin } from '@lexical/react/LexicalListPlugin';
import { RichTextPlugin } from '@lexical/react/LexicalRichTextPlugin';
import { TablePlugin } from '@lexical/react/LexicalTablePlugin';
import type { Provider } from '@lexical/yjs';
import { useCallback, useMemo, useState } from 'react';
import type { WebsocketProvider } from 'y-websocket';
import type * as Y from 'yjs';
import type { StructureFields } from '../../../shared/editor';
import { ConnectionBadge } from './collab/ConnectionBadge';
import { asLexicalProvider, createPageProvider } from './collab/createProvider';
import { presenceColour } from './collab/palette';
import { PresenceList } from './collab/PresenceList';
import { useCollabStatus } from './collab/useCollabStatus';
import { useWriteAccessChange } from './collab/useWriteAccessChange';
import { EditorEnvironmentContext, type EditorEnvironment, type StructureDialogRequest } from './EditorEnvironment';
import { HistoryPanel } from './history/HistoryPanel';
import { SnapshotViewer } from './history/SnapshotViewer';
import { editorNodes } from './nodes/editorNodes';
import { EditablePlugin } from './plugins/EditablePlugin';
import { PlainPastePlugin } from './plugins/PlainPastePlugin';
import { ShortcutsPlugin } from './plugins/ShortcutsPlugin';
import { StructureDropPlugin } from './plugins/StructureDropPlugin';
import { StructureIndexPlugin } from './plugins/StructureIndexPlugin';
import { StructureDialog } from './structure/StructureDialog';
import { insertStructure, replaceStructure } from './structure/structureEdits';
import { StructuresPanel } from './structure/StructuresPanel';
import { editorTheme } from './theme';
import { EditorToolbar } from './toolbar/EditorToolbar';
import { ShortcutList } from './toolbar/ShortcutList';
import type { EditorUser, EmbedRenderers } from './types';

export interface PageEditorProps {
  pageId: string;
  /** From the server's page access; a locked (signed) page is read only whatever this says. */
  canEdit: boolean;
  me: EditorUser;
  embedRenderers?: EmbedRenderers;
  /**
   * The server changed my write access while the page was open (demoted to reader, organisation
   * viewer, or promoted back): the page's details, `canEdit` among them, are out of date.
   */
  onAccessChanged?: () => void;
}

function StructureDialogHost({ request, onClose }: { request: StructureDialogRequest; onClose: () => void }) {
  const [editor] = useLexicalComposerContext();
  return (
    <StructureDialog
      request={request}
      onClose={onClose}
      onDone={(content) => {
        if (request.mode === 'redraw') replaceStructure(editor, request.nodeKey, content);
        else insertStructure(editor, content);
        onClose();
      }}
    />
  );
}

function ReadOnlyNote({ locked }: { locked: boolean }) {
  return (
    <span className="rounded-full bg-paper-deep px-2 py-0.5 text-xs font-medium text-ink-soft ring-1 ring-inset ring-fold-strong" data-testid="read-only-note">
      {locked ? 'Signed and locked: no more changes' : 'Read only'}
    </span>
  );
}

function DemotedNotice({ onDismiss }: { onDismiss: () => void }) {
  return (
    <div role="status" data-testid="demoted-notice" className="mb-3 flex items-start justify-between gap-3 rounded-md border border-fold-strong bg-paper-deep px-3 py-2 text-sm text-ink">
      Your role changed while this page was open: you can still read it, but you can no longer edit it.
      <button type="button" className="text-xs font-medium hover:underline" onClick={onDismiss}>
        Dismiss
      </button>
    </div>
  );
}

const noRenderers: EmbedRenderers = {};

/**
 * The page body: rich text shared live through the page's Yjs document at `/collab/<pageId>`,
 * with structure blocks, presence, connection state, the page's structure list and its history.
 */
export function PageEditor({ pageId, canEdit, me, embedRenderers = noRenderers, onAccessChanged }: PageEditorProps) {
  const [provider, setProvider] = useState<WebsocketProvider | null>(null);
  const providerFactory = useCallback((id: string, docs: Map<string, Y.Doc>): Provider => {
    const created = createPageProvider(id, docs);
    setProvider(created);
    return asLexicalProvider(created);
  }, []);
  const status = useCollabStatus(provider, me.id);
  const accessChange = useWriteAccessChange(status.readOnly, onAccessChanged);
  // The server's word comes at once; `canEdit` follows when the page's details are fetched again.
  const editable = canEdit && !status.locked && status.readOnly !== true;

  const [structures, setStructures] = useState<StructureFields[]>([]);
  const [dialog, setDialog] = useState<StructureDialogRequest | null>(null);
  const [snapshotId, setSnapshotId] = useState<string | null>(null);
  const [linkOpen, setLinkOpen] = useState(false);
  const [keysOpen, setKeysOpen] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);

  const awarenessData = useMemo(() => ({ userId: me.id }), [me.id]);
  const environment = useMemo<EditorEnvironment>(
    () => ({ pageId, embedRenderers, openStructureDialog: setDialog, structures: new Map(structures.map((s) => [s.structureKey, s])) }),
    [pageId, embedRenderers, structures],
  );
  const openAdd = useCallback((start: 'text' | 'draw') => setDialog({ mode: 'insert', start }), []);

  return (
    <EditorEnvironmentContext.Provider value={environment}>
      <LexicalCollaboration>
        <LexicalComposer
          initialConfig={{
            namespace: `page-${pageId}`,
            theme: editorTheme,
            nodes: editorNodes,
            editable: false,
            // The shared document is the only source of content.
            editorState: null,
            onError: (error) => console.error('[page editor]', error),
          }}
        >
          <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_15rem]">
            <div className="min-w-0">
              <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
                <div className="flex items-center gap-3">
                  <ConnectionBadge phase={status.phase} />
                  {!editable && <ReadOnlyNote locked={status.locked} />}
                </div>
                <div className="flex items-center gap-3">
                  <PresenceList people={status.people} />
                  {editable && (
                    <div className="relative">
                      <button type="button" aria-expanded={keysOpen} onClick={() => setKeysOpen((was) => !was)} className="rounded px-2 py-1 text-xs font-medium text-tide-700 hover:bg-tide-50">
                        Keys
                      </button>
                      {keysOpen && <ShortcutList />}
                    </div>
                  )}
                </div>
              </div>
              {editable && (
                <EditorToolbar
                  pageId={pageId}
                  structures={structures}
                  canEmbed={embedRenderers.attachment !== undefined}
                  linkOpen={linkOpen}
                  setLinkOpen={setLinkOpen}
                  onAddStructure={openAdd}
                />
              )}
              {accessChange.demoted && <DemotedNotice onDismiss={accessChange.dismiss} />}
              {notice && (
                <div role="alert" className="mb-3 flex items-start justify-between gap-3 rounded-md border border-ember-100 bg-ember-50 px-3 py-2 text-sm text-ember-700">
                  {notice}
                  <button type="button" className="text-xs font-medium hover:underline" onClick={() => setNotice(null)}>
                    Dismiss
                  </button>
                </div>
              )}
              <div className="relative">
                <RichTextPlugin
                  contentEditable={
                    <ContentEditable
                      aria-label="Page text"
                      data-testid="page-text"
                      className="min-h-64 pb-10 text-[15px] text-ink outline-none"
                      aria-placeholder="Aim, procedure, observations…"
                      placeholder={<div className="pointer-events-none absolute left-0 top-2 text-ink-faint">{editable ? 'Aim, procedure, observations…' : 'Nothing written on this page yet.'}</div>}
                    />
                  }
                  ErrorBoundary={LexicalErrorBoundary}
                />
              </div>
            </div>
            <aside className="space-y-4 xl:sticky xl:top-4 xl:self-start" aria-label="About this page">
              <StructuresPanel structures={structures} />
              <HistoryPanel pageId={pageId} onOpen={setSnapshotId} />
            </aside>
          </div>
          <EditablePlugin editable={editable} />
          <ListPlugin />
          <CheckListPlugin />
          <TablePlugin />
          <LinkPlugin />
          <ClickableLinkPlugin />
          <PlainPastePlugin />
          <ShortcutsPlugin openStructureDialog={() => openAdd('text')} openLinkEditor={() => setLinkOpen(true)} />
          <StructureDropPlugin onProblem={setNotice} />
          <StructureIndexPlugin onChange={setStructures} />
          <CollaborationPlugin
            id={pageId}
            providerFactory={providerFactory}
            // The server writes a new page's first paragraph before anyone gets the document
            // (server/collab/firstParagraph.ts), so two editors opening it at once share that one.
            shouldBootstrap={false}
            username={me.name}
            cursorColor={presenceColour(me.id)}
            awarenessData={awarenessData}
          />
          {dialog && <StructureDialogHost request={dialog} onClose={() => setDialog(null)} />}
        </LexicalComposer>
      </LexicalCollaboration>
      {snapshotId && <SnapshotViewer pageId={pageId} snapshotId={snapshotId} environment={environment} onClose={() => setSnapshotId(null)} />}
    </EditorEnvironmentContext.Provider>
  );
}
