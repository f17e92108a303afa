import { useMutation } from '@tanstack/react-query';
import type { TrialPrintInput } from '@shared/schemas/trial-print.ts';
import { ApiError, readBody, toApiError } from '@/lib/api-client.ts';
import { attachmentName, saveBlob } from '@/lib/download-file.ts';

/**
 * `POST /api/patterns/:id/trial-print`: the form's values as the template PDF, nothing saved.
 * The answer is the file; a refusal is an {@link ApiError} naming options and spec fields.
 */
export async function trialPrint(patternId: number, body: TrialPrintInput): Promise<{ fileName: string; bytes: number }> {
  let res: Response;
  try {
    res = await fetch(`/api/patterns/${patternId}/trial-print`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/pdf, application/json' },
      body: JSON.stringify(body),
      credentials: 'same-origin',
    });
  } catch {
    throw new ApiError(0, 'network', 'Latchet could not reach its server. Check the connection and try again.');
  }
  if (!res.ok) throw toApiError(res, await readBody(res));
  const blob = await res.blob();
  const fileName = attachmentName(res.headers.get('content-disposition'), 'trial-print-not-saved.pdf');
  saveBlob(blob, fileName);
  return { fileName, bytes: blob.size };
}

/** The trial print as a mutation, so the print panel reads pending and error states as usual. */
export function useTrialPrint(patternId: number) {
  return useMutation({ mutationFn: (body: TrialPrintInput) => trialPrint(patternId, body) });
}
