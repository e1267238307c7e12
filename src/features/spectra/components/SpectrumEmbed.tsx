import { useAttachmentMeta } from '../api/queries';
import { LinkedStructure, type StructureForSpectrum } from './LinkedStructure';
import { SpectrumView } from './SpectrumView';

/**
 * The body of an attached file shown inside the page text: a spectrum is plotted (beside its
 * structure when the embed is linked to one); any other file is named with a download link.
 */
export function SpectrumEmbed({ attachmentId, linkedStructure }: { attachmentId: string; linkedStructure: StructureForSpectrum | null }) {
  const meta = useAttachmentMeta(attachmentId);
  if (meta.isPending) return <p className="text-sm text-ink-soft">Loading the file…</p>;
  if (meta.isError) return <p className="text-sm text-ember-700">{meta.error.message}</p>;
  const file = meta.data;
  const download = (
    <a className="text-sm font-medium text-tide-700 hover:underline" href={`/api/attachments/${encodeURIComponent(file.id)}/content`} download={file.displayName}>
      {file.displayName}
    </a>
  );
  if (!file.spectrum) {
    return (
      <div className="space-y-1">
        {download}
        {file.parseError && <p className="text-xs text-ember-700">Kept as a plain file; it could not be read as a spectrum: {file.parseError}</p>}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-3 md:flex-row md:items-start">
      {linkedStructure && <LinkedStructure structure={linkedStructure} />}
      <div className="min-w-0 flex-1 space-y-1">
        <SpectrumView attachmentId={file.id} />
        {download}
      </div>
    </div>
  );
}
