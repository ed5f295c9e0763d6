import type { z } from 'zod';
import { appApiConfig, type ApiClientConfig } from './api-client';
import { ApiRequestError, NO_RESPONSE_MESSAGE, NO_RESPONSE_STATUS, toApiRequestError, UNREADABLE_ANSWER_MESSAGE } from './api-error';

// Files in and out of the API. Separate from api-client because a download is not JSON and an
// upload reports its progress, which only XMLHttpRequest offers; the token and the 401 rule are
// the same as for every other call.

export interface DownloadedFile {
  blob: Blob;
  filename: string;
}

/** The filename of a `Content-Disposition: attachment; filename="…"` header, or the fallback. */
export function filenameFromDisposition(header: string | null, fallback: string): string {
  if (!header) return fallback;
  const encoded = /filename\*\s*=\s*UTF-8''([^;]+)/i.exec(header);
  if (encoded) {
    try {
      return safeFilename(decodeURIComponent(encoded[1].trim()), fallback);
    } catch {
      // fall through to the plain form
    }
  }
  const plain = /filename\s*=\s*"([^"]*)"|filename\s*=\s*([^;]+)/i.exec(header);
  return safeFilename((plain?.[1] ?? plain?.[2] ?? '').trim(), fallback);
}

function safeFilename(name: string, fallback: string): string {
  // Only the last path segment: a server never chooses the folder a file is saved in.
  const base = name.split(/[\\/]/).pop() ?? '';
  return base === '' ? fallback : base;
}

/**
 * What a finished upload's answer means: the parsed body, or the error to throw. A 401 calls
 * `onUnauthorized` as any other call would.
 */
export function readUploadAnswer<T>(status: number, responseText: string, schema: z.ZodType<T>, onUnauthorized: () => void): T {
  let body: unknown;
  try {
    body = responseText ? (JSON.parse(responseText) as unknown) : null;
  } catch {
    body = null;
  }
  if (status < 200 || status >= 300) {
    if (status === 401) onUnauthorized();
    throw toApiRequestError(status, body);
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new ApiRequestError(NO_RESPONSE_STATUS, UNREADABLE_ANSWER_MESSAGE);
  return parsed.data;
}

export interface UploadOptions<T> {
  schema: z.ZodType<T>;
  /** From 0 to 1 as the request body is sent. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

export function createTransfer(config: ApiClientConfig) {
  async function download(path: string, fallbackName: string): Promise<DownloadedFile> {
    const token = config.getToken();
    let response: Response;
    try {
      response = await fetch(`${config.baseUrl}${path}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
    } catch {
      throw new ApiRequestError(NO_RESPONSE_STATUS, NO_RESPONSE_MESSAGE);
    }
    if (!response.ok) {
      const body: unknown = await response.json().catch(() => null);
      if (response.status === 401) config.onUnauthorized();
      throw toApiRequestError(response.status, body);
    }
    return { blob: await response.blob(), filename: filenameFromDisposition(response.headers.get('Content-Disposition'), fallbackName) };
  }

  function upload<T>(path: string, form: FormData, options: UploadOptions<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      const request = new XMLHttpRequest();
      request.open('POST', `${config.baseUrl}${path}`);
      request.setRequestHeader('Accept', 'application/json');
      const token = config.getToken();
      if (token) request.setRequestHeader('Authorization', `Bearer ${token}`);
      request.upload.onprogress = (event) => {
        if (event.lengthComputable && event.total > 0) options.onProgress?.(event.loaded / event.total);
      };
      request.upload.onload = () => options.onProgress?.(1);
      request.onerror = () => reject(new ApiRequestError(NO_RESPONSE_STATUS, NO_RESPONSE_MESSAGE));
      request.onabort = () => reject(new DOMException('The upload was cancelled', 'AbortError'));
      request.onload = () => {
        try {
          resolve(readUploadAnswer(request.status, request.responseText, options.schema, config.onUnauthorized));
        } catch (error) {
          reject(error instanceof Error ? error : new Error(String(error)));
        }
      };
      options.signal?.addEventListener('abort', () => request.abort(), { once: true });
      request.send(form);
    });
  }

  return { download, upload };
}

const transfer = createTransfer(appApiConfig);

/** GET a file with the session's token (never in the address), for saving with `saveFile`. */
export const apiDownload = transfer.download;

/** POST multipart form data with upload progress; the answer is checked against `schema`. */
export const apiUpload = transfer.upload;

/** Hands a downloaded file to the browser to save, without putting any token in an address. */
export function saveFile({ blob, filename }: DownloadedFile): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the address is released.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
