// Screen calibration for the true-size preview. CSS says 96 px per inch, but real screens
// differ, so the person matches an on-screen rectangle to a bank card once; the ratio is kept
// per browser (localStorage), since it belongs to this screen, not to the account.

/** An ID-1 card (bank, ID and loyalty cards): 85.60 x 53.98 mm (ISO/IEC 7810). */
export const ID1_CARD_MM = { width: 85.6, height: 53.98 } as const;

/** CSS's nominal px per mm: 96 px per inch (W3C CSS Values 4) over 25.4 mm per inch. */
export const CSS_PX_PER_MM = 96 / 25.4;

/** Where the ratio is kept in localStorage. */
export const SCREEN_SCALE_KEY = 'latchet.screen.pxPerMm';

// A ratio outside this is a slip of the slider, not a screen (about 25 to 500 px per inch).
const MIN_PX_PER_MM = 1;
const MAX_PX_PER_MM = 20;

/** CSS px per mm when a card `cardWidthPx` CSS px wide on screen matches a real ID-1 card. */
export function pxPerMmFromCard(cardWidthPx: number): number {
  return cardWidthPx / ID1_CARD_MM.width;
}

/** The card's on-screen size in CSS px for a ratio (what the calibration rectangle is drawn at). */
export function cardSizePx(pxPerMm: number): { width: number; height: number } {
  return { width: ID1_CARD_MM.width * pxPerMm, height: ID1_CARD_MM.height * pxPerMm };
}

/** True when a ratio is one a real screen could have. */
export function isPlausibleRatio(pxPerMm: number): boolean {
  return Number.isFinite(pxPerMm) && pxPerMm >= MIN_PX_PER_MM && pxPerMm <= MAX_PX_PER_MM;
}

type Store = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

/** The stored ratio, or null when this browser was never calibrated (or the value is junk). */
export function loadPxPerMm(store: Store | undefined = globalThis.localStorage): number | null {
  try {
    const raw = store?.getItem(SCREEN_SCALE_KEY);
    const v = raw == null ? NaN : Number(raw);
    return isPlausibleRatio(v) ? v : null;
  } catch {
    // Storage can be off (private mode, policy): the preview then simply has no true size.
    return null;
  }
}

/** Keeps the ratio for this browser; refuses implausible values. */
export function savePxPerMm(pxPerMm: number, store: Store | undefined = globalThis.localStorage): boolean {
  if (!isPlausibleRatio(pxPerMm)) return false;
  try {
    store?.setItem(SCREEN_SCALE_KEY, String(pxPerMm));
    return true;
  } catch {
    return false;
  }
}

/** Forgets the calibration (e.g. after moving the browser to another screen). */
export function clearPxPerMm(store: Store | undefined = globalThis.localStorage): void {
  try {
    store?.removeItem(SCREEN_SCALE_KEY);
  } catch {
    // nothing kept, nothing to forget
  }
}
