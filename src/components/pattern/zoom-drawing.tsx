import { memo, useState } from 'react';
import { cx } from '@/components/ui/cx.ts';
import { CalibrateScreen } from './calibrate-screen.tsx';
import { loadPxPerMm } from './screen-scale.ts';
import { svgSizeMm, usePanZoom } from './use-pan-zoom.ts';

export interface ZoomDrawingProps {
  svg: string;
  label: string;
  /** Height of the drawing's box (Tailwind classes), e.g. "h-40 lg:h-72". */
  boxClassName?: string;
}

const toolClass = 'h-8 min-w-8 px-2 text-sm font-medium text-hide-800 hover:bg-hide-100 disabled:opacity-50';

/**
 * The engine's SVG in a box that zooms and pans (wheel, drag, pinch, + - 0 and arrow keys,
 * the buttons), so its labels can be read on any screen; "True size" draws it at the
 * browser's calibrated px per mm. The markup comes from our own renderer, which escapes every
 * label, so it is safe to place as HTML.
 */
export const ZoomDrawing = memo(function ZoomDrawing({ svg, label, boxClassName = 'h-48 lg:h-72' }: ZoomDrawingProps) {
  const sizeMm = svgSizeMm(svg);
  const [ratio, setRatio] = useState<number | null>(() => loadPxPerMm());
  const [calibrating, setCalibrating] = useState(false);
  const pz = usePanZoom(sizeMm, ratio);
  const { view } = pz;
  const percent = Math.round((view.scale / (ratio ?? 96 / 25.4)) * 100);

  return (
    <figure className="m-0 grid min-w-0 gap-1.5">
      <div className="flex flex-wrap items-center justify-between gap-x-2 gap-y-1">
        <div role="group" aria-label="Zoom" className="inline-flex overflow-hidden rounded-md ring-1 ring-hide-300">
          <button type="button" className={toolClass} onClick={pz.zoomOut} aria-label="Zoom out">
            −
          </button>
          <button type="button" className={toolClass} onClick={pz.zoomIn} aria-label="Zoom in">
            +
          </button>
          <button type="button" className={cx(toolClass, view.mode === 'fit' && 'bg-hide-800 text-paper hover:bg-hide-800')} aria-pressed={view.mode === 'fit'} onClick={pz.fit}>
            Whole strap
          </button>
          {ratio !== null && (
            <button type="button" className={cx(toolClass, view.mode === 'true' && 'bg-hide-800 text-paper hover:bg-hide-800')} aria-pressed={view.mode === 'true'} onClick={() => pz.trueSize()}>
              True size
            </button>
          )}
        </div>
        <span className="hidden text-xs tabular-nums text-hide-600 sm:inline" data-testid="zoom-level">
          {view.mode === 'true' ? 'true size' : `${percent} % of ${ratio !== null ? 'true' : 'nominal'} size`}
        </span>
        <button type="button" className="text-xs font-medium text-hide-700 underline underline-offset-2 hover:text-hide-900" onClick={() => setCalibrating(true)}>
          {ratio === null ? 'Set up true size' : 'Calibrate'}
        </button>
      </div>
      <div
        ref={pz.box}
        role="img"
        aria-label={`${label}. Zoom with + and −, 0 to fit, arrow keys to move.`}
        aria-roledescription="zoomable drawing"
        data-testid="drawing-preview"
        data-mode={view.mode}
        data-px-per-mm={view.scale}
        tabIndex={0}
        className={cx('drawing-screen relative touch-none select-none overflow-hidden rounded-md border border-hide-200 bg-white', 'cursor-grab active:cursor-grabbing', boxClassName)}
        {...pz.handlers}
      >
        <div
          className="absolute left-0 top-0 [&>svg]:block [&>svg]:h-full [&>svg]:w-full"
          style={{ width: sizeMm.w * view.scale, height: sizeMm.h * view.scale, transform: `translate(${view.x}px, ${view.y}px)` }}
          dangerouslySetInnerHTML={{ __html: svg }}
        />
        {view.mode === 'true' && ratio !== null && (
          // A 1 in square at the same ratio, to check the calibration with a rule against the screen.
          <div
            data-testid="true-size-square"
            aria-hidden="true"
            className="pointer-events-none absolute bottom-1 right-1 border border-brass-700 bg-brass-100/60 text-[10px] leading-none text-brass-700"
            style={{ width: 25.4 * ratio, height: 25.4 * ratio }}
          >
            <span className="p-0.5">1 in</span>
          </div>
        )}
      </div>
      <figcaption className="hidden text-xs text-hide-600 lg:block">
        {view.mode === 'true' ? 'Drawn at this screen’s calibrated size: hold a rule to it.' : 'Drag or use the arrow keys to move; pinch, wheel or + and − to zoom.'} The printed template is
        exact: check its calibration square with a rule.
      </figcaption>
      {calibrating && (
        <CalibrateScreen
          initial={ratio}
          onClose={() => setCalibrating(false)}
          onSaved={(r) => {
            setRatio(r);
            setCalibrating(false);
            pz.trueSize(r);
          }}
        />
      )}
    </figure>
  );
});
