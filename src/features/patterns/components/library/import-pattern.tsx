import { useRef, useState } from 'react';
import { ApiError } from '@/lib/api-client.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useImportPattern } from '../../api/mutations.ts';

/**
 * Brings in a pattern file exported from Latchet. Returns the button and, after a refused
 * file, the list of what is wrong (every field named; nothing is half-imported), so the
 * screen can place each where it reads best.
 */
export function useImportPatternControl(onImported: (id: number) => void) {
  const input = useRef<HTMLInputElement>(null);
  const importer = useImportPattern();
  const [problems, setProblems] = useState<string[]>([]);

  const onFile = (file: File | undefined) => {
    if (!file) return;
    setProblems([]);
    importer.mutate(file, {
      onSuccess: (created) => onImported(created.pattern.id),
      onError: (err) => setProblems(err instanceof ApiError && err.fields ? Object.values(err.fields) : [err.message]),
      onSettled: () => {
        if (input.current) input.current.value = '';
      },
    });
  };

  const button = (
    <>
      <input ref={input} type="file" accept=".json,application/json" className="sr-only" aria-label="Pattern file to import" onChange={(e) => onFile(e.target.files?.[0])} />
      <Button variant="secondary" busy={importer.isPending} onClick={() => input.current?.click()}>
        Import file
      </Button>
    </>
  );
  const notice =
    problems.length > 0 ? (
      <Notice tone="danger" role="alert" title="The file was not imported">
        <ul className="list-disc pl-5">
          {problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      </Notice>
    ) : null;
  return { button, notice };
}
