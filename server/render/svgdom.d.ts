// svgdom 0.1.24 ships no types; this is the part of its API Latchet uses.
declare module 'svgdom' {
  export function createSVGWindow(): Window & typeof globalThis;
  export function createHTMLWindow(): Window & typeof globalThis;
  export const config: {
    setFontDir(dir: string): typeof config;
    setFontFamilyMappings(map: Record<string, string>): typeof config;
    preloadFonts(): typeof config;
  };
}
