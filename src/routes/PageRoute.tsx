import { lazy } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageBodySlot } from '../components/PageBodySlot';
import { SafetyNote } from '../components/SafetyNote';
import { AttachmentsPanel, type AttachmentRenderers } from '../features/attachments';
import { pageKeys, usePage } from '../features/pages/api/queries';
import { PageFacts } from '../features/pages/components/PageFacts';
import { PageTitleEditor } from '../features/pages/components/PageTitleEditor';
import type { EmbedRenderers } from '../features/page-editor';
import { RecordPanel } from '../features/signing/components/RecordPanel';
import { SpectrumEmbed, SpectrumThumbnail, SpectrumView } from '../features/spectra';
import { formatPageNumber } from '../lib/format';
import { useSignedInPerson } from './AppLayout';

// Our editor code loads only when a page is opened (the Lexical and Yjs libraries sit in the shared vendor chunk).
const PageEditor = lazy(() => import('../features/page-editor').then((module) => ({ default: module.PageEditor })));

// Spectra are drawn by their own feature, both inside the text and in the page's file list.
const embedRenderers: EmbedRenderers = { attachment: (props) => <SpectrumEmbed {...props} /> };
const attachmentRenderers: AttachmentRenderers = {
  thumbnail: (attachment) => attachment.spectrum && <SpectrumThumbnail spectrum={attachment.spectrum} />,
  detail: (attachment) => <SpectrumView attachmentId={attachment.id} />,
};

/**
 * One notebook page. The page's parts come from their features and are put together here:
 * the body editor is mounted as the child of PageBodySlot.
 */
export function PageRoute() {
  const { pageId = '' } = useParams();
  const page = usePage(pageId);
  const person = useSignedInPerson();
  const queryClient = useQueryClient();

  if (page.isPending) return <LoadingState label="Opening the page…" />;
  if (page.isError) return <ErrorState error={page.error} />;

  const data = page.data;
  return (
    <article className="flex min-h-[calc(100vh-4rem)] flex-col">
      <nav aria-label="Where you are" className="mb-2 flex items-center gap-2 text-xs font-semibold uppercase tracking-[0.14em] text-tide-500">
        <Link to="/notebooks" className="hover:underline">
          Notebooks
        </Link>
        <span aria-hidden>/</span>
        <Link to={`/notebooks/${data.notebookId}`} className="hover:underline">
          {data.notebookTitle}
        </Link>
        <span aria-hidden>/</span>
        <span className="font-mono normal-case tracking-normal text-ink-soft">p. {formatPageNumber(data.number)}</span>
      </nav>
      <PageTitleEditor page={data} />
      <PageFacts page={data} />
      <div className="mt-6 flex-1">
        <PageBodySlot>
          <PageEditor
            key={data.id}
            pageId={data.id}
            canEdit={data.access.canEdit && !data.locked}
            me={{ id: person.id, name: person.name }}
            embedRenderers={embedRenderers}
            onAccessChanged={() => queryClient.invalidateQueries({ queryKey: pageKeys.one(data.id) })}
          />
        </PageBodySlot>
      </div>
      {/* Files added to a signed page are kept as addenda, so writers may still add them. */}
      <AttachmentsPanel pageId={data.id} canUpload={data.access.role !== 'reader' && person.role !== 'viewer'} renderers={attachmentRenderers} />
      <RecordPanel pageId={data.id} me={person} onChanged={() => queryClient.invalidateQueries({ queryKey: pageKeys.one(data.id) })} />
      <footer className="mt-8 border-t border-fold pt-4">
        <SafetyNote />
      </footer>
    </article>
  );
}
