import { ApiError, toApiError } from './api-client.ts';

/**
 * Sends a multipart upload and reports how much has left the browser. `fetch` cannot report
 * upload progress, so this one request goes through XMLHttpRequest; errors come back as the
 * same {@link ApiError} every other request gives (413, 415 and 400 keep the server's words).
 */
export function uploadWithProgress<T>(path: string, body: FormData, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      let parsed: unknown = undefined;
      const type = xhr.getResponseHeader('content-type') ?? '';
      if (xhr.responseText) parsed = type.includes('json') ? safeJson(xhr.responseText) : xhr.responseText;
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(parsed as T);
      } else {
        reject(toApiError(new Response(null, { status: xhr.status, statusText: xhr.statusText }), parsed));
      }
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'Latchet could not reach its server. Check the connection and try again.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}
