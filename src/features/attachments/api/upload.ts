import type { ApiErrorBody, AttachmentSummary } from '../../../../shared/schemas';
import { ApiError } from '../../../lib/api';

export interface RunningUpload {
  done: Promise<AttachmentSummary[]>;
  cancel(): void;
}

/**
 * Sends one file as multipart/form-data. XMLHttpRequest rather than fetch because only it reports
 * upload progress in browsers; the server streams the body straight into storage.
 */
export function uploadFile(pageId: string, file: File, onProgress: (sentBytes: number, totalBytes: number) => void): RunningUpload {
  const request = new XMLHttpRequest();
  const done = new Promise<AttachmentSummary[]>((resolve, reject) => {
    request.open('POST', `/api/pages/${encodeURIComponent(pageId)}/attachments`);
    request.responseType = 'json';
    request.setRequestHeader('Accept', 'application/json');
    request.upload.onprogress = (event) => onProgress(event.loaded, event.lengthComputable ? event.total : file.size);
    request.onload = () => {
      if (request.status === 201) {
        resolve(request.response as AttachmentSummary[]);
        return;
      }
      const error = (request.response as Partial<ApiErrorBody> | null)?.error;
      reject(new ApiError(request.status, error?.code ?? 'http_error', error?.message ?? `The server answered ${request.status}.`));
    };
    request.onerror = () => reject(new ApiError(0, 'network_error', 'The upload stopped: the server could not be reached or closed the connection.'));
    request.onabort = () => reject(new ApiError(0, 'cancelled', 'Upload cancelled; nothing was kept.'));
    const form = new FormData();
    form.append('files', file, file.name);
    request.send(form);
  });
  return { done, cancel: () => request.abort() };
}
