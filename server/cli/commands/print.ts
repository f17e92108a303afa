// `latchet print [--preset NAME | --spec FILE.json] [strap options] --paper letter -o FILE.pdf`
// Writes the true-scale template PDF (or, by --format or the -o extension, the full-size SVG or
// the cutter SVG). Bad options exit 2 with one line naming the option; nothing is written.
import { writeFileSync } from 'node:fs';
import { EngineError } from '@shared/pattern/index.ts';
import { EXPORT_FORMATS, PagePlanError, parsePrintOptions, printRevision, PrintOptionsError, stopPrintWorker, type ExportFormat, type SizeDef } from '../../modules/print/index.ts';
import { parseLengthMm } from '../../modules/print/units.ts';
import { specFromArgv, withEngineErrors } from './strap-args.ts';

const PRINT_OPTIONS = {
  out: { type: 'string', short: 'o' },
  paper: { type: 'string' },
  'paper-width': { type: 'string' },
  'paper-length': { type: 'string' },
  orientation: { type: 'string' },
  margin: { type: 'string' },
  overlap: { type: 'string' },
  'job-sheet': { type: 'boolean' },
  size: { type: 'string' },
  sizes: { type: 'string' },
  format: { type: 'string' },
  name: { type: 'string' },
  revision: { type: 'string' },
  date: { type: 'string' },
} as const;

/** CLI flag for each print option field (the query string's names differ only here). */
const FLAG: Record<string, string> = { width: '--paper-width', length: '--paper-length', jobSheet: '--job-sheet' };
const flag = (field: string) => FLAG[field] ?? `--${field}`;

/** "XS=10in,S=12in,M=14in" -> sizes with girths in mm. */
export function parseSizes(text: string): SizeDef[] {
  return text.split(',').map((part) => {
    const [name, girth] = part.split('=').map((s) => s.trim());
    const mm = girth ? parseLengthMm(girth) : undefined;
    if (!name || mm === undefined || mm <= 0) throw new EngineError('--sizes', `"${part}" is not NAME=GIRTH with a unit, e.g. M=14in`, 'NAME=GIRTH,...');
    return { name, girthMm: mm };
  });
}

function formatFor(out: string, given: string | undefined): ExportFormat {
  if (given !== undefined) {
    if (!(EXPORT_FORMATS as readonly string[]).includes(given)) throw new EngineError('--format', `"${given}" is not one of ${EXPORT_FORMATS.join(', ')}`, EXPORT_FORMATS.join(' | '));
    return given as ExportFormat;
  }
  if (out.endsWith('.cutter.svg')) return 'cutter.svg';
  if (out.endsWith('.svg')) return 'svg';
  return 'pdf';
}

export async function run(argv: string[]): Promise<number> {
  return withEngineErrors(async () => {
    const { spec, values: v } = specFromArgv(argv, PRINT_OPTIONS);
    const str = (k: string) => (typeof v[k] === 'string' ? (v[k] as string) : undefined);
    const out = str('out');
    if (!out) throw new EngineError('-o', 'say where to write the file with -o FILE.pdf', 'a file path');
    const format = formatFor(out, str('format'));
    const raw = {
      ...(str('paper') !== undefined ? { paper: str('paper') } : {}),
      ...(str('paper-width') !== undefined ? { width: str('paper-width') } : {}),
      ...(str('paper-length') !== undefined ? { length: str('paper-length') } : {}),
      ...(str('orientation') !== undefined ? { orientation: str('orientation') } : {}),
      ...(str('margin') !== undefined ? { margin: str('margin') } : {}),
      ...(str('overlap') !== undefined ? { overlap: str('overlap') } : {}),
      ...(v['job-sheet'] === true ? { jobSheet: true } : {}),
      ...(str('size') !== undefined ? { size: str('size') } : {}),
    };
    const date = str('date') ?? new Date().toISOString().slice(0, 10);
    if (Number.isNaN(new Date(date).getTime())) throw new EngineError('--date', `"${date}" is not a date`, 'YYYY-MM-DD');
    const sizesText = str('sizes');
    const meta = {
      patternName: str('name') ?? (spec.name || spec.kind),
      revision: str('revision') ?? '',
      date,
      sizes: sizesText !== undefined ? parseSizes(sizesText) : (spec.sizes ?? []),
    };
    try {
      const options = parsePrintOptions(raw);
      const f = await printRevision(spec, options, meta, format, (p) => {
        if (process.stderr.isTTY && p.stage === 'pages' && p.total > 4) process.stderr.write(`page ${p.done} of ${p.total}\r`);
      });
      writeFileSync(out, f.body);
      process.stderr.write(`wrote ${out} (${f.body.length} bytes; suggested name ${f.fileName})\n`);
      return 0;
    } catch (e) {
      if (e instanceof PrintOptionsError) {
        const first = e.fields[0];
        throw new EngineError(flag(first?.field ?? 'options'), first ? first.message.replace(/^[A-Za-z]+: /, '') : e.message);
      }
      if (e instanceof PagePlanError) throw new EngineError(flag(e.field), e.message.replace(/^[A-Za-z]+: /, ''));
      throw e;
    } finally {
      await stopPrintWorker();
    }
  });
}
