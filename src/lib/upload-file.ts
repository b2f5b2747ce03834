/**
 * Sends one file as multipart form data with the session's CSRF token, reporting upload progress.
 * fetch cannot report how much of a request body has gone out, so this one call uses XMLHttpRequest.
 */
import { ApiError, api, apiErrorFromResponse } from './api-client';

export interface UploadProgress {
  loaded: number;
  total: number;
  /** 0..1 */
  fraction: number;
}

export interface UploadOptions {
  /** the multipart field the server reads; "file" unless told */
  fieldName?: string;
  /** text fields sent beside the file (e.g. the recipe's revision) */
  fields?: Record<string, string>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

const CSRF_PATH = '/api/auth/csrf';

async function csrfToken(): Promise<string> {
  // The server keeps one token per session, so asking again returns the token the app client holds.
  const body = await api.get<{ token?: unknown }>(CSRF_PATH);
  if (!body || typeof body.token !== 'string' || !body.token) {
    throw new ApiError({ status: 0, code: 'csrf_missing', message: 'Could not start a secure session. Please reload the page.' });
  }
  return body.token;
}

function parseJson(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function sendOnce<T>(path: string, file: Blob, token: string, options: UploadOptions): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    if (options.signal?.aborted) {
      reject(new DOMException('The upload was cancelled.', 'AbortError'));
      return;
    }
    const form = new FormData();
    for (const [name, value] of Object.entries(options.fields ?? {})) form.append(name, value);
    form.append(options.fieldName ?? 'file', file, file instanceof File ? file.name : 'upload');

    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-CSRF-Token', token);

    xhr.upload.onprogress = (event) => {
      if (!options.onProgress) return;
      const total = event.lengthComputable ? event.total : file.size;
      options.onProgress({ loaded: event.loaded, total, fraction: total > 0 ? Math.min(1, event.loaded / total) : 0 });
    };
    xhr.onload = () => {
      const body = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else reject(apiErrorFromResponse(xhr.status, body, xhr.getResponseHeader('Retry-After')));
    };
    xhr.onerror = () => reject(new ApiError({ status: 0, code: 'network', message: "Can't reach Hearthswap right now. Check your connection and try again." }));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));

    const abort = () => xhr.abort();
    options.signal?.addEventListener('abort', abort, { once: true });
    xhr.onloadend = () => options.signal?.removeEventListener('abort', abort);
    xhr.send(form);
  });
}

function isCsrfRejection(error: unknown): boolean {
  return error instanceof ApiError && error.status === 403 && /csrf/i.test(`${error.code} ${error.message}`);
}

/** POSTs `file` to `path` and resolves with the parsed JSON answer; failures reject with ApiError. */
export async function uploadFile<T>(path: string, file: Blob, options: UploadOptions = {}): Promise<T> {
  try {
    return await sendOnce<T>(path, file, await csrfToken(), options);
  } catch (error) {
    // A session that rotated since the token was read refuses it once; the next read has the new one.
    if (!isCsrfRejection(error)) throw error;
    api.resetCsrfToken();
    return sendOnce<T>(path, file, await csrfToken(), options);
  }
}
