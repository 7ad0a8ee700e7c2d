import { ApiError } from '@/shared/api/client';
import type { ApiErrorBody } from '@/shared/api/contracts';

export type UploadProgress = { sentBytes: number; totalBytes: number };

/**
 * Multipart upload beside the JSON-only `api()`: same `/api` base, cookie and error shape, plus upload
 * progress (fetch cannot report it, so this uses XMLHttpRequest). The only other network caller on the client.
 */
export function apiUpload<T>(path: string, body: FormData, onProgress?: (progress: UploadProgress) => void): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', `/api${path}`);
    request.withCredentials = true;
    request.setRequestHeader('Accept', 'application/json');
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress?.({ sentBytes: event.loaded, totalBytes: event.total });
    };
    request.onerror = () => reject(new ApiError(0, 'network', 'Faintline cannot reach its server. Check your connection and try again.'));
    request.onload = () => {
      let data: unknown;
      try {
        data = request.responseText ? JSON.parse(request.responseText) : undefined;
      } catch {
        data = undefined;
      }
      if (request.status >= 200 && request.status < 300) return resolve(data as T);
      const error = (data as ApiErrorBody | undefined)?.error;
      const fallback =
        request.status === 413
          ? 'That photo is too large.'
          : request.status === 415
            ? 'That file type cannot be used.'
            : `The server answered ${request.status}`;
      reject(
        new ApiError(
          request.status,
          error?.code ?? (request.status >= 500 ? 'internal' : 'bad-request'),
          error?.message ?? fallback,
          error?.fields ?? {},
        ),
      );
    };
    request.send(body);
  });
}
