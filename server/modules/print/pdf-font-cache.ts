// Caches on the process-wide parsed fonts (pdf-doc.ts) that make every document after the
// first cheaper without changing a byte: shaping a word and subsetting a glyph set are pure
// functions of the font and their input. Profiled on the 21 in collar (node --cpu-prof):
// fontkit's shaping took about a third of a template's time and subsetting about a seventh,
// because pdfkit keeps its caches per document and each document met the words afresh.

/** The parts of a fontkit font these caches wrap (fontkit 2, as pdfkit 0.20 uses it). */
export interface CacheableFont {
  layout: (text: string, ...rest: unknown[]) => unknown;
  /** fontkit's glyph objects by id; a glyph keeps the characters it was first made for. */
  _glyphs?: Record<number, unknown>;
  createSubset: () => { glyphs: number[]; encode: () => Uint8Array };
}

/** Most shaped words and subsets kept per font; past it the cache starts again (bounded memory). */
const MAX_WORDS = 20_000;
const MAX_SUBSETS = 64;

interface Run {
  positions: object[];
}

/** A copy of a glyph run whose positions pdfkit may scale in place (its layoutRun does). */
function copyRun<T extends Run>(run: T): T {
  const copy = Object.assign(Object.create(Object.getPrototypeOf(run) as object) as T, run);
  copy.positions = run.positions.map((p) => Object.assign(Object.create(Object.getPrototypeOf(p) as object) as object, p));
  return copy;
}

/**
 * Wraps `font.layout` (plain calls: no features) with a cache of shaped words shared by every
 * document. pdfkit asks one word at a time and scales the positions it is given, so each
 * answer is a fresh copy of the first, untouched run. The glyph objects are shared: they
 * carry the characters they were shaped from, which the ToUnicode map needs.
 */
function cacheLayouts(font: CacheableFont): void {
  const layout = font.layout.bind(font);
  const runs = new Map<string, Run>();
  font.layout = (text: string, ...rest: unknown[]) => {
    if (rest.some((r) => r !== undefined)) return layout(text, ...rest);
    const hit = runs.get(text);
    if (hit) return copyRun(hit);
    // Shaped with an empty glyph cache, so the glyphs carry this word's own characters (the
    // ToUnicode map reads them) whatever was printed before: same input, same bytes.
    const glyphs = font._glyphs;
    font._glyphs = {};
    let run: Run;
    try {
      run = layout(text) as Run;
    } finally {
      font._glyphs = glyphs;
    }
    if (runs.size >= MAX_WORDS) runs.clear();
    runs.set(text, copyRun(run));
    return run;
  };
}

/**
 * Wraps `font.createSubset` so a subset's bytes are remembered by its glyph list (ids in the
 * order the document first used them, which fixes the subset's glyph numbering and bytes).
 */
function cacheSubsets(font: CacheableFont): void {
  const createSubset = font.createSubset.bind(font);
  const encoded = new Map<string, Uint8Array>();
  font.createSubset = () => {
    const subset = createSubset();
    const encode = subset.encode.bind(subset);
    subset.encode = () => {
      const key = subset.glyphs.join(',');
      const hit = encoded.get(key);
      if (hit) return hit;
      const bytes = encode();
      if (encoded.size >= MAX_SUBSETS) encoded.delete(encoded.keys().next().value as string);
      encoded.set(key, bytes);
      return bytes;
    };
    return subset;
  };
}

/** Adds both caches to a parsed font (once per process per font). */
export function cacheFontWork(font: CacheableFont): void {
  cacheLayouts(font);
  cacheSubsets(font);
}
