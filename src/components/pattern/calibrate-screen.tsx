import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { cardSizePx, CSS_PX_PER_MM, ID1_CARD_MM, savePxPerMm } from './screen-scale.ts';

export interface CalibrateScreenProps {
  initial: number | null;
  onSaved: (pxPerMm: number) => void;
  onClose: () => void;
}

// The slider's range in px per mm: about 50 to 500 px per inch.
const MIN = 2;
const MAX = 20;

/**
 * One-time screen calibration: the person holds a bank or ID card (ID-1, 85.60 x 53.98 mm,
 * ISO/IEC 7810) to the screen and sizes the rectangle until it matches; the px per mm is
 * kept in this browser. On a narrow screen the card stands on its short side.
 */
export function CalibrateScreen({ initial, onSaved, onClose }: CalibrateScreenProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [ratio, setRatio] = useState(initial ?? CSS_PX_PER_MM);
  const [narrow, setNarrow] = useState(false);
  useEffect(() => {
    dialog.current?.showModal();
    // A phone held upright is narrower than a card at its real size: the card stands on its short side.
    setNarrow(window.innerWidth < 640);
  }, []);
  const card = cardSizePx(ratio);
  const w = narrow ? card.height : card.width;
  const h = narrow ? card.width : card.height;
  const nudge = (px: number) => setRatio((r) => Math.min(MAX, Math.max(MIN, r + px / ID1_CARD_MM.width)));

  return (
    <dialog
      ref={dialog}
      aria-labelledby="calibrate-title"
      onCancel={onClose}
      className="m-auto max-h-[100dvh] w-full max-w-3xl overflow-y-auto rounded-lg bg-paper p-4 text-hide-900 backdrop:bg-hide-900/60 sm:p-6"
    >
      <h2 id="calibrate-title" className="text-lg font-semibold">
        Set up true size on this screen
      </h2>
      <p className="mt-1 text-sm text-hide-700">
        Hold a bank or ID card flat against the screen and size the box until its edges meet the card&rsquo;s (
        {narrow ? 'its short side across' : 'its long side across'}). Any card of the standard size works (85.60 × 53.98 mm, ISO/IEC 7810 ID-1). This browser keeps
        the setting.
      </p>
      <div className="my-4 flex justify-center overflow-hidden">
        <div
          data-testid="calibration-card"
          className="border-2 border-hide-800 bg-brass-100"
          style={{ width: w, height: h, borderRadius: 3.18 * ratio }}
        />
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" variant="secondary" aria-label="Smaller" onClick={() => nudge(-1)}>
          −
        </Button>
        <input
          type="range"
          aria-label="Card size on screen"
          min={MIN}
          max={MAX}
          step={0.005}
          value={ratio}
          onChange={(e) => setRatio(Number(e.target.value))}
          className="min-w-0 flex-1 accent-hide-800"
        />
        <Button size="sm" variant="secondary" aria-label="Larger" onClick={() => nudge(1)}>
          +
        </Button>
      </div>
      <p className="mt-2 text-xs tabular-nums text-hide-600" data-testid="calibration-ratio">
        {ratio.toFixed(3)} px per mm ({Math.round(ratio * 25.4)} px per inch)
      </p>
      <div className="mt-4 flex justify-end gap-2">
        <Button variant="ghost" onClick={onClose}>
          Cancel
        </Button>
        <Button
          onClick={() => {
            if (savePxPerMm(ratio)) onSaved(ratio);
          }}
        >
          Use this size
        </Button>
      </div>
    </dialog>
  );
}
