import { createSVGWindow } from 'svgdom';

/** A DOM for svg.js in Node: a fresh svgdom window and its document. */
export function svgdomDom(): { window: Window; document: Document } {
  const window = createSVGWindow();
  return { window, document: window.document };
}
