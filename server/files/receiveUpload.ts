import { Upload } from '@aws-sdk/lib-storage';
import busboy from 'busboy';
import type { Request } from 'express';
import { createHash, randomUUID } from 'node:crypto';
import { Transform } from 'node:stream';
import type { StoredSpectrum } from '../db/schema';
import { HttpError } from '../http/errors';
import type { Storage } from '../storage/s3';
import { displayNameFor, recordedOriginalName } from './displayName';
import { couldBeSpectrum, detectMediaType, SNIFF_BYTES } from './mediaType';
import { readSpectrum } from './spectrum';
import { removeObject, storageKeyFor } from './storage';

/** Room for multipart boundaries and part headers on top of the files' own bytes. */
const MULTIPART_ALLOWANCE = 64 * 1024;
const MAX_FILES_PER_REQUEST = 20;
/** S3 needs parts of at least 5 MiB (except the last); files up to this size go up in one request. */
export const PART_SIZE = 5 * 1024 * 1024;
/** Spectra are parsed from memory; larger files are kept but not plotted. */
const SPECTRUM_TEXT_MAX = 24 * 1024 * 1024;

export interface ReceivedFile {
  id: string;
  storageKey: string;
  originalName: string;
  displayName: string;
  size: number;
  sha256: string;
  mediaType: string;
  spectrum: StoredSpectrum | null;
  parseError: string | null;
}

function tooLarge(limit: number): HttpError {
  const megabytes = Math.round((limit / (1024 * 1024)) * 10) / 10;
  return new HttpError(413, 'too_large', `Files larger than ${megabytes} MB cannot be uploaded (the limit is per upload)`);
}

/** Refuses an upload whose declared size is already over the limit, before reading any of it. */
export function checkDeclaredSize(req: Request, limit: number): void {
  if (!req.is('multipart/form-data')) throw new HttpError(400, 'not_multipart', 'Send files as multipart/form-data');
  const declared = Number(req.headers['content-length']);
  if (Number.isFinite(declared) && declared > limit + MULTIPART_ALLOWANCE) throw tooLarge(limit);
}

/** What a stored file is: its media type from the content and, for spectra, the parsed data or why not. */
export async function describeReceived(
  file: Omit<ReceivedFile, 'mediaType' | 'spectrum' | 'parseError'>,
  head: Buffer,
  whole: Buffer | null,
): Promise<ReceivedFile> {
  const detection = await detectMediaType(head, file.originalName);
  if (!detection.spectrum) return { ...file, mediaType: detection.mediaType, spectrum: null, parseError: null };
  const reading = whole
    ? readSpectrum(whole.toString('utf8'), detection.spectrum)
    : { spectrum: null, parseError: `Spectra larger than ${SPECTRUM_TEXT_MAX / (1024 * 1024)} MB are kept but not plotted` };
  return { ...file, mediaType: detection.mediaType, ...reading };
}

/**
 * Streams every file of a multipart request straight into object storage (in parts for large
 * files) while hashing and counting it; nothing is buffered whole except text small enough to be a
 * spectrum. `limit` caps the files' bytes in one request: going over aborts the uploads, deletes
 * what was stored and answers 413. Either every file of the request is stored, or none is.
 */
export function receiveFiles(req: Request, storage: Storage, limit: number): Promise<ReceivedFile[]> {
  return new Promise((resolve, reject) => {
    let parser: busboy.Busboy;
    try {
      parser = busboy({ headers: req.headers, defParamCharset: 'utf8', limits: { files: MAX_FILES_PER_REQUEST, fields: 20 } });
    } catch {
      reject(new HttpError(400, 'bad_multipart', 'The upload is not valid multipart form data'));
      return;
    }
    const uploads: Upload[] = [];
    const pending: Promise<ReceivedFile>[] = [];
    const keys: string[] = [];
    let received = 0;
    let failure: HttpError | null = null;

    const fail = async (error: HttpError) => {
      if (failure) return;
      failure = error;
      req.unpipe(parser);
      req.resume();
      await Promise.all(uploads.map((upload) => upload.abort().catch(() => undefined)));
      await Promise.allSettled(pending);
      await Promise.all(keys.map((key) => removeObject(storage, key)));
      reject(error);
    };

    parser.on('file', (_field, stream, info) => {
      if (failure) {
        stream.resume();
        return;
      }
      const id = randomUUID();
      const storageKey = storageKeyFor(id);
      const originalName = recordedOriginalName(info.filename ?? '');
      keys.push(storageKey);
      const hash = createHash('sha256');
      const headChunks: Buffer[] = [];
      let headBytes = 0;
      let kept: Buffer[] | null = [];
      let size = 0;
      const meter = new Transform({
        transform(chunk: Buffer, _encoding, callback) {
          received += chunk.length;
          if (received > limit) {
            callback(tooLarge(limit));
            return;
          }
          size += chunk.length;
          hash.update(chunk);
          if (headBytes < SNIFF_BYTES) {
            headChunks.push(chunk.subarray(0, SNIFF_BYTES - headBytes));
            headBytes += Math.min(chunk.length, SNIFF_BYTES - headBytes);
          }
          if (kept && size === chunk.length && !couldBeSpectrum(chunk, originalName)) kept = null;
          if (kept && size > SPECTRUM_TEXT_MAX) kept = null;
          kept?.push(chunk);
          callback(null, chunk);
        },
      });
      meter.on('error', (error) => {
        stream.resume();
        void fail(error instanceof HttpError ? error : new HttpError(400, 'upload_failed', 'The upload could not be read'));
      });
      stream.pipe(meter);
      const upload = new Upload({
        client: storage.client,
        params: { Bucket: storage.bucket, Key: storageKey, Body: meter, ContentType: 'application/octet-stream' },
        partSize: PART_SIZE,
        queueSize: 2,
        leavePartsOnError: false,
      });
      uploads.push(upload);
      const stored = upload.done().then(() =>
        describeReceived(
          { id, storageKey, originalName, displayName: displayNameFor(originalName), size, sha256: hash.digest('hex') },
          Buffer.concat(headChunks),
          kept ? Buffer.concat(kept) : null,
        ),
      );
      // An aborted upload rejects before `fail` gets to wait for it; it is handled there.
      stored.catch(() => undefined);
      pending.push(stored);
    });
    parser.on('filesLimit', () => void fail(new HttpError(400, 'too_many_files', `Send at most ${MAX_FILES_PER_REQUEST} files at once`)));
    parser.on('error', () => void fail(new HttpError(400, 'bad_multipart', 'The upload is not valid multipart form data')));
    parser.on('close', () => {
      if (failure) return;
      Promise.all(pending).then(
        (files) => (files.length ? resolve(files) : void fail(new HttpError(400, 'no_files', 'The upload holds no files'))),
        (error) => {
          if (!failure) console.error('[files] storing an upload failed:', error);
          void fail(new HttpError(503, 'storage_unavailable', 'The file store did not accept the upload; nothing was kept'));
        },
      );
    });
    req.on('aborted', () => void fail(new HttpError(400, 'upload_interrupted', 'The upload was interrupted; nothing was kept')));
    req.pipe(parser);
  });
}
