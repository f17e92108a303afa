import { useState } from 'react';
import { useFieldArray, useWatch } from 'react-hook-form';
import { PIECES_MAX, type PieceSpec } from '@shared/schemas/strap-spec.ts';
import { Button } from '@/components/ui/button.tsx';
import { newPiece, type NewPieceKind } from './new-piece.ts';
import { PieceFields } from './piece-fields.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

const ROLE: Record<PieceSpec['role'], string> = {
  strap: 'the strap: its length comes from the girth',
  bridge: 'sits in the loop between buckle and strap',
  accessory: 'cut beside the strap',
};
const ADD: Array<{ kind: NewPieceKind; label: string }> = [
  { kind: 'keeper', label: 'Add a keeper' },
  { kind: 'bridge', label: 'Add a second strap half' },
  { kind: 'fixed', label: 'Add a piece of fixed length' },
];

/** Every piece the pattern cuts: the strap, its other half, keepers and extra pieces; add and remove them. */
export function PiecesSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'pieces', keyName: 'key' });
  const pieces = useWatch({ control, name: 'pieces' }) as PieceSpec[];
  // Pieces the maker just added open at once; the others open on demand.
  const [opened, setOpened] = useState<Set<string>>(new Set());
  const add = (kind: NewPieceKind) => {
    const piece = newPiece(kind, pieces.map((p) => p.id));
    append(piece);
    setOpened((s) => new Set(s).add(piece.id));
  };
  return (
    <fieldset className="rounded-lg border border-hide-200 bg-white/70 px-4 pt-2 pb-4" aria-label="Pieces">
      <legend className="px-1.5 text-xs font-semibold uppercase tracking-widest text-hide-600">Pieces</legend>
      <p className="mb-3 text-xs text-hide-600">Each piece is cut as its own blank. Open one to change its length, width, ends, taper and stitching.</p>
      <ul className="grid gap-2">
        {fields.map((f, i) => {
          const piece = pieces[i];
          if (!piece) return null;
          return (
            <li key={f.key} className="rounded-md border border-hide-200 bg-paper/50" data-testid={`piece-${piece.id}`}>
              <details open={opened.has(piece.id)} className="group">
                <summary className="flex cursor-pointer list-none flex-wrap items-center justify-between gap-2 px-3 py-2">
                  <span>
                    <span className="font-medium text-hide-900">{piece.name || 'Unnamed piece'}</span>
                    <span className="text-xs text-hide-600">
                      {' '}
                      · {ROLE[piece.role]} · {piece.count} to cut
                    </span>
                  </span>
                  <span className="text-xs text-hide-600 group-open:hidden">Open</span>
                </summary>
                <div className="grid gap-3 border-t border-hide-100 px-3 py-3">
                  <PieceFields control={control} unit={unit} disabled={disabled} setValue={setValue} index={i} />
                  {!disabled && piece.role !== 'strap' && (
                    <div>
                      <Button size="sm" variant="danger" onClick={() => remove(i)}>
                        Remove {piece.name || 'this piece'}
                      </Button>
                    </div>
                  )}
                </div>
              </details>
            </li>
          );
        })}
      </ul>
      {!disabled && pieces.length < PIECES_MAX && (
        <div className="mt-3 flex flex-wrap gap-2">
          {ADD.map((a) => (
            <Button key={a.kind} size="sm" variant="secondary" onClick={() => add(a.kind)}>
              {a.label}
            </Button>
          ))}
        </div>
      )}
    </fieldset>
  );
}
