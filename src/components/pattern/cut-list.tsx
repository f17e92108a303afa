import type { ReactNode } from 'react';
import type { CutList } from '@shared/pattern/layout-types.ts';
import { formatLength, formatMm } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { mmToOz } from '@shared/units/length.ts';

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div>
      <h4 className="text-xs font-semibold uppercase tracking-wider text-hide-600">{title}</h4>
      <ul className="mt-1 space-y-0.5 text-sm">{children}</ul>
    </div>
  );
}

/** What to cut and gather before starting: blanks, hardware, fasteners, punches, thread. */
export function CutListView({ list, unit }: { list: CutList; unit: LengthUnit }) {
  return (
    <div className="grid grid-cols-[repeat(auto-fit,minmax(12rem,1fr))] gap-4" data-testid="cut-list">
      <Group title="Blanks">
        {list.blanks.map((b) => (
          <li key={b.pieceId}>
            <span className="font-medium">
              {b.count} × {b.name}
            </span>{' '}
            <span className="tabular-nums text-hide-700">
              {formatLength(b.lengthMm, unit)} × {formatLength(b.widthMm, unit)}, {formatMm(b.thicknessMm)} mm (
              {formatMm(mmToOz(b.thicknessMm))} oz)
            </span>
          </li>
        ))}
      </Group>
      {list.hardware.length > 0 && (
        <Group title="Hardware">
          {list.hardware.map((h) => (
            <li key={h.item}>
              {h.count} × {h.item}
              {h.note && <span className="text-hide-600"> ({h.note})</span>}
            </li>
          ))}
        </Group>
      )}
      {list.fasteners.length > 0 && (
        <Group title="Fasteners">
          {list.fasteners.map((f, i) => (
            <li key={`${f.kind}-${i}`}>
              {f.count} × {f.kind}, {f.layers} {f.layers === 1 ? 'layer' : 'layers'} ({formatMm(f.stackMm)} mm stack
              {f.postLengthMm !== undefined && `, ${formatMm(f.postLengthMm)} mm post`})
            </li>
          ))}
        </Group>
      )}
      {list.punches.length > 0 && (
        <Group title="Punches">
          {list.punches.map((p) => (
            <li key={p.size}>
              {p.size} ({formatMm(p.diameterMm)} mm): {p.holes} {p.holes === 1 ? 'hole' : 'holes'}
            </li>
          ))}
        </Group>
      )}
      {list.threadMm > 0 && (
        <Group title="Thread">
          <li>{formatLength(list.threadMm, unit)} for the saddle stitch</li>
        </Group>
      )}
    </div>
  );
}
