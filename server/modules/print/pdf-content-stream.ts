import { deflateSync } from 'node:zlib';

/**
 * zlib level for page content. Level 1 made a 12-size run's 14 pages about 17 % larger (100
 * to 117 kB) and deflated them about three times faster; deflating at pdfkit's default level
 * was an eighth of that PDF's time (CPU profile). Fonts and other objects keep pdfkit's level.
 */
export const CONTENT_DEFLATE_LEVEL = 1;

/** The parts of pdfkit 0.20's PDFReference (a stream object) this module takes over. */
interface StreamRef {
  buffer: Uint8Array[];
  compress: boolean;
  data: Record<string, unknown>;
  write(chunk: unknown): unknown;
  finalize(): void;
}

/**
 * Gathers a page's content stream as text and deflates it once when the page ends. pdfkit turns
 * every operator into its own byte array as it is written (a twentieth of a template's time)
 * and deflates at zlib's default level. The bytes are the same operators pdfkit would write, a
 * newline after each, converted as pdfkit converts them (low byte of each UTF-16 unit).
 */
export function gatherPageContent(doc: PDFKit.PDFDocument): void {
  const ref = (doc as unknown as { page: { content: StreamRef } }).page.content;
  // addPage has already written the page's base transform through pdfkit's own write.
  let text = Buffer.concat(ref.buffer).toString('latin1');
  ref.buffer = [];
  const write = ref.write.bind(ref);
  ref.write = (chunk: unknown) => {
    if (typeof chunk !== 'string') {
      // Not something we write (images would be); keep pdfkit's order and handling.
      ref.buffer.push(Buffer.from(text, 'latin1'));
      text = '';
      return write(chunk);
    }
    text += `${chunk}\n`;
    return ref;
  };
  const finalize = ref.finalize.bind(ref);
  ref.finalize = () => {
    if (text) ref.buffer.push(Buffer.from(text, 'latin1'));
    text = '';
    const raw = Buffer.concat(ref.buffer);
    ref.buffer = raw.length ? [deflateSync(raw, { level: CONTENT_DEFLATE_LEVEL })] : [];
    ref.compress = false;
    if (raw.length) ref.data.Filter = 'FlateDecode';
    else delete ref.data.Filter;
    finalize();
  };
}
