import { ApiError, readBody, toApiError } from './api-client.ts';

/** The file name a `Content-Disposition: attachment; filename="..."` header gives. */
export function attachmentName(header: string | null, fallback: string): string {
  const star = header?.match(/filename\*=UTF-8''([^;]+)/i)?.[1];
  if (star) return decodeURIComponent(star);
  return header?.match(/filename="([^"]+)"/i)?.[1] ?? fallback;
}

/** Hands a blob to the browser as a download under `fileName`. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // The click has started the download; the URL can go once the event loop moves on.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * Fetches a file the server prints (with the session cookie) and saves it; a refusal comes
 * back as an {@link ApiError} with the server's `fields`, so options can show their message.
 */
export async function downloadFile(path: string, fallbackName: string): Promise<{ fileName: string; bytes: number }> {
  let res: Response;
  try {
    res = await fetch(path, { credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'network', 'Latchet could not reach its server. Check the connection and try again.');
  }
  if (!res.ok) throw toApiError(res, await readBody(res));
  const blob = await res.blob();
  const fileName = attachmentName(res.headers.get('content-disposition'), fallbackName);
  saveBlob(blob, fileName);
  return { fileName, bytes: blob.size };
}
