/** The export kinds a revision can be downloaded as. */
export const EXPORT_FORMATS = ['pdf', 'svg', 'cutter.svg'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/** MIME type per export. */
export const CONTENT_TYPES: Record<ExportFormat, string> = {
  pdf: 'application/pdf',
  svg: 'image/svg+xml',
  'cutter.svg': 'image/svg+xml',
};

function slug(s: string): string {
  return (
    s
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'pattern'
  );
}

/**
 * A download name that says what the file is and stays safe in any file system and in a
 * Content-Disposition header: "collar-for-juniper-r3-size-m-letter.pdf".
 */
export function downloadFileName(p: { patternName: string; revision?: number | string; size?: string; paper?: string; format: ExportFormat }): string {
  const parts = [slug(p.patternName)];
  if (p.revision !== undefined && p.revision !== '') parts.push(`r${slug(String(p.revision))}`);
  if (p.size) parts.push(p.size.toLowerCase() === 'all' ? 'all-sizes' : `size-${slug(p.size)}`);
  if (p.format === 'pdf' && p.paper) parts.push(slug(p.paper));
  const ext = p.format === 'pdf' ? 'pdf' : p.format === 'svg' ? 'svg' : 'cutter.svg';
  return `${parts.join('-')}.${ext}`;
}
