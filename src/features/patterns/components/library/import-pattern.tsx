import { useRef, useState } from 'react';
import { ApiError } from '@/lib/api-client.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useImportPattern } from '../../api/mutations.ts';

/** Brings in a pattern file exported from Latchet; every problem in the file is named, nothing half-imported. */
export function ImportPattern({ onImported }: { onImported: (id: number) => void }) {
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

  return (
    <div className="grid justify-items-end gap-2">
      <input ref={input} type="file" accept=".json,application/json" className="sr-only" id="import-pattern-file" aria-label="Pattern file to import" onChange={(e) => onFile(e.target.files?.[0])} />
      <Button variant="secondary" busy={importer.isPending} onClick={() => input.current?.click()}>
        Import file
      </Button>
      {problems.length > 0 && (
        <Notice tone="danger" role="alert" title="The file was not imported">
          <ul className="list-disc pl-5">
            {problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </Notice>
      )}
    </div>
  );
}
