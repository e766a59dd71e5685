import type { ParseError, ParseSettings } from '../../../shared/uploads';
import type { SubmissionInput, UploadMeta } from '../../../shared/schemas/submissions';
export type { MySubmission } from '../../../shared/schemas/submissions';
import { isErrorEnvelope } from '../../../shared/api/errors';
import { apiBase, ApiRequestError, sendJson } from '../../ui';

export type UploadResult =
  | {
      fileName: string;
      ok: true;
      token: string;
      /** Acoustic curves on the catalogue's grid, other kinds thinned: enough to draw, not every point. */
      preview: { x: number[]; y: number[]; phase: number[] | null };
      /** How many points the file held, and the line saying what was read. */
      pointCount: number;
      summary: string;
      settings: ParseSettings;
      warnings: string[];
    }
  | { fileName: string; ok: false; error: ParseError };

/**
 * Sends one file to be read. XMLHttpRequest rather than fetch because only it reports upload
 * progress, which the file list shows as a bar per file.
 */
export function uploadFile(file: Blob, name: string, meta: UploadMeta[number], onProgress: (fraction: number) => void): Promise<UploadResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${apiBase()}/api/uploads/parse`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiRequestError(0, 'network', 'The upload did not reach the server'));
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // handled below
      }
      if (xhr.status >= 200 && xhr.status < 300 && body && typeof body === 'object' && Array.isArray((body as { files?: unknown }).files)) {
        onProgress(1);
        resolve((body as { files: UploadResult[] }).files[0]);
        return;
      }
      if (isErrorEnvelope(body)) reject(new ApiRequestError(xhr.status, body.error.code, body.error.message, body.error.details));
      else reject(new ApiRequestError(xhr.status, 'http_error', `Upload failed with status ${xhr.status}`));
    };
    const form = new FormData();
    form.append('files', file, name);
    form.append('meta', JSON.stringify([meta]));
    xhr.send(form);
  });
}

export const sendSubmission = (body: SubmissionInput) => sendJson<{ setId: number; driverSlug: string }>('POST', '/api/submissions', body);
