import type { Drawing } from '@shared/render/drawing.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { svgdomDom } from '../../render/svgdom-window.ts';

/**
 * The full-size SVG: every piece on one sheet in physical units (width/height in mm), drawn
 * by the shared renderer over svgdom so it matches the browser preview byte for byte.
 */
export function buildFullSizeSvg(drawing: Drawing): string {
  return renderSvg(drawing, svgdomDom());
}
