import { useState } from 'react';
import { cx } from '@/components/ui/cx.ts';

/**
 * The engine's SVG, either scaled to the panel or at its own size in CSS millimetres
 * (nominal: screens differ, paper does not). The markup comes from our own renderer, which
 * escapes every label, so it is safe to place as HTML.
 */
export function DrawingView({ svg, label }: { svg: string; label: string }) {
  const [zoom, setZoom] = useState<'fit' | 'full'>('fit');
  return (
    <figure className="m-0">
      <div className="mb-2 flex justify-end">
        <div role="group" aria-label="Preview size" className="inline-flex rounded-md ring-1 ring-hide-300">
          {(['fit', 'full'] as const).map((z) => (
            <button
              key={z}
              type="button"
              aria-pressed={zoom === z}
              onClick={() => setZoom(z)}
              className={cx('px-2.5 py-1 text-xs font-medium first:rounded-l-md last:rounded-r-md', zoom === z ? 'bg-hide-800 text-paper' : 'text-hide-800 hover:bg-hide-50')}
            >
              {z === 'fit' ? 'Whole strap' : 'Full size'}
            </button>
          ))}
        </div>
      </div>
      <div
        role="img"
        aria-label={label}
        data-testid="drawing-preview"
        tabIndex={0}
        className={cx(
          'drawing-screen overflow-auto rounded-md border border-hide-200 bg-white p-3',
          zoom === 'fit' ? '[&>svg]:h-auto [&>svg]:w-full' : 'max-h-[28rem]',
        )}
        dangerouslySetInnerHTML={{ __html: svg }}
      />
      <figcaption className="mt-1.5 text-xs text-hide-600">
        {zoom === 'fit' ? 'Scaled to fit the screen.' : 'Full size at the screen’s nominal 96 px per inch (W3C CSS units); screens vary.'} The printed
        template is exact: check its calibration square with a rule.
      </figcaption>
    </figure>
  );
}
