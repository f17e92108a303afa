// The HTML twin every e-mail of ours carries beside its plain text: the same paragraphs, one
// button for the link, and a small footer. One template so every mail looks and escapes alike.
import escapeHtml from 'escape-html';

/** A simple, inline-styled HTML body with the same words as the plain text. */
export function mailHtml(paragraphs: string[], link: { href: string; label: string }, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`).join('\n');
  return `<!doctype html><html><body style="font-family:'IBM Plex Sans',Arial,sans-serif;color:#2b2118;line-height:1.5;max-width:560px">
${body}
<p style="margin:18px 0"><a href="${escapeHtml(link.href)}" style="background:#7a4a24;color:#fff;padding:8px 14px;border-radius:4px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="margin:0;font-size:13px;color:#6b5a4a">${escapeHtml(footer)}</p>
</body></html>`;
}
