import type { ReceivedFile } from './receiveUpload';

/** What the audit trail's `attachment.added` event records of a stored file. */
export function attachmentAddedDetails(file: ReceivedFile, addendum: boolean): Record<string, unknown> {
  return {
    attachmentId: file.id,
    name: file.displayName,
    size: file.size,
    sha256: file.sha256,
    mediaType: file.mediaType,
    addendum,
    ...(file.spectrum ? { spectrum: file.spectrum.dataType || file.spectrum.format } : {}),
    ...(file.parseError ? { parseError: file.parseError } : {}),
  };
}
